import { useQuery } from '@tanstack/react-query';
import { allergenLabel } from '@shared/domain/allergens';
import { clientQuery } from '@/features/clients/api/clients.queries';
import { useMe } from '@/features/auth/hooks/use-me';
import { Card, EmptyState, ErrorState, KeptCopyNotice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { useKeptAnswer } from '@/lib/use-kept-answer';
import { useOnline } from '@/lib/online';
import { Cautions } from '@/components/domain/cautions';
import { DemoNotice } from '@/features/auth/components/demo-notice';
import { SlotShares } from '@/features/clients/components/slot-shares';

function Linked({ clientId }: { clientId: number }) {
  const me = useMe();
  const online = useOnline();
  const query = clientQuery(clientId);
  const q = useQuery(query);
  // Kept on the device with the plan: the page opens without a network too.
  const { fromDevice, seeding } = useKeptAnswer(q, query.queryKey, 'my-targets', me);
  if (q.data === undefined) return q.isError && !seeding ? <ErrorState error={q.error} retry={() => q.refetch()} /> : <PageSkeleton />;
  const c = q.data;
  const t = c.targets;
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-5">
      <PageHeader title="My targets" lead={t.mode === 'computed' ? 'Computed by your coach from your profile' : 'Set by your coach'} />
      {fromDevice !== null && (
        <KeptCopyNotice what="targets" savedAt={fromDevice} online={online} retry={() => void q.refetch()} retrying={q.isFetching}>
          If your coach has changed them since, the change shows here once you are back online.
        </KeptCopyNotice>
      )}
      <DemoNotice>A demo account: these targets belong to an invented person and are not advice.</DemoNotice>
      <Card>
        <dl className="grid grid-cols-2 gap-3">
          {[
            ['Energy', `${t.targetKcal} kcal`],
            ['Net carbs, at most', `${t.netCarbCapG} g`],
            ['Protein', `${t.proteinG} g`],
            ['Fat', `${t.fatG} g`],
          ].map(([k, v]) => (
            <div key={k} className="rounded-lg bg-paper p-3">
              <dt className="text-sm text-ink-faint">{k}</dt>
              <dd className="num text-2xl font-bold">{v}</dd>
            </div>
          ))}
        </dl>
        <SlotShares day={t} slots={t.slots} />
      </Card>
      <Card>
        <h2 className="mb-2 text-xl">What your coach plans around</h2>
        <p>Allergens: {c.allergens.length ? c.allergens.map(allergenLabel).join(', ') : 'none recorded'}</p>
        <p>Dislikes: {c.dislikes.length ? c.dislikes.join(', ') : 'none recorded'}</p>
        <p className="mt-2 text-sm text-ink-faint">Something wrong? Tell your coach.</p>
      </Card>
      <Cautions topic="diet" compact />
    </div>
  );
}

export function Component() {
  const me = useMe();
  if (!me.clientId) {
    return (
      <div className="flex flex-col gap-6">
        <PageHeader title="My targets" />
        <EmptyState title="Your profile is not linked yet">Ask your coach to link your account to your client profile.</EmptyState>
      </div>
    );
  }
  return <Linked clientId={me.clientId} />;
}
