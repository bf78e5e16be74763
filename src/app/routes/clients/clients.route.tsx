import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { allergenLabel } from '@shared/domain/allergens';
import type { ClientDto, ClientListItemDto } from '@shared/schemas/clients.schema';
import { clientsQuery } from '@/features/clients/api/clients.queries';
import { useCreateClient } from '@/features/clients/api/use-client-mutations';
import { ClientForm, emptyClient } from '@/features/clients/components/client-form';
import { Button } from '@/components/ui/button';
import { Card, EmptyState, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { paths } from '@/config/paths';
import { DemoNotice } from '@/features/auth/components/demo-notice';
import { FILTER_FROM, ListFilter } from '@/components/ui/list-filter';
import { filterByText } from '@/lib/words';
import { useMe } from '@/features/auth/hooks/use-me';
import { useUnsavedGuard } from '@/lib/use-unsaved-guard';
import { ClientImport } from '@/features/clients/components/client-import';
import { InviteClients } from '@/features/clients/components/invite-clients';
import { Cautions } from '@/components/domain/cautions';

const isFull = (c: ClientListItemDto): c is ClientDto => 'targets' in c;

/**
 * The clients as a table, with a filter box once the list is long. Archived clients are left out until the coach
 * asks for them (a switch that says how many there are).
 */
function ClientList({ clients: all }: { clients: ClientListItemDto[] }) {
  const [find, setFind] = useState('');
  const [withArchived, setWithArchived] = useState(false);
  const archived = all.filter((c) => c.archivedAt).length;
  const clients = withArchived ? all : all.filter((c) => !c.archivedAt);
  const shown = filterByText(clients, find, (c) => [c.name, ...(isFull(c) ? [...c.allergens.map(allergenLabel), ...c.dislikes] : [])]);
  return (
    <>
      {clients.length >= FILTER_FROM && (
        <ListFilter label="Find a client" placeholder="name, allergen or dislike" value={find} onChange={setFind} shown={shown.length} total={clients.length} className="mb-3" />
      )}
      {archived > 0 && (
        <label className="mb-3 flex w-fit items-center gap-2 text-sm">
          <input type="checkbox" className="h-4 w-4" checked={withArchived} onChange={(e) => setWithArchived(e.target.checked)} />
          Show archived clients ({archived})
        </label>
      )}
      {clients.length === 0 ? (
        <p className="text-ink-soft">Every client is archived. Show them above, or add a new client.</p>
      ) : shown.length === 0 ? (
        <p className="text-ink-soft">No client matches “{find.trim()}”.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[40rem] text-left [&_td]:px-2 [&_td]:whitespace-nowrap [&_th]:px-2">
            <thead>
              <tr className="border-b border-line text-sm text-ink-faint">
                <th className="py-2">Name</th>
                <th className="text-right">Portions per plate</th>
                <th className="text-right">kcal</th>
                <th className="text-right">Net-carb cap</th>
                <th className="text-right">Protein</th>
                <th className="pl-6">Allergens</th>
                <th className="pl-4">Account</th>
              </tr>
            </thead>
            <tbody>
              {shown.map((c) => (
                <tr key={c.id} className="border-b border-line">
                  <td className="py-2">
                    <Link className="font-bold underline" to={paths.client(c.id)}>
                      {c.name}
                    </Link>
                    {c.archivedAt && <span className="ml-2 rounded bg-paper-deep px-1 text-xs font-bold text-ink-soft">Archived</span>}
                  </td>
                  <td className="num text-right">{c.householdMultiplier}</td>
                  {isFull(c) ? (
                    <>
                      <td className="num text-right">{c.targets.targetKcal}</td>
                      <td className="num text-right">{c.targets.netCarbCapG} g</td>
                      <td className="num text-right">{c.targets.proteinG} g</td>
                      <td className="pl-6">{c.allergens.map(allergenLabel).join(', ') || '—'}</td>
                      <td className="pl-4">{c.account ? 'Joined' : c.invitation ? 'Invited' : 'Not invited'}</td>
                    </>
                  ) : (
                    <td colSpan={5} />
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}

export function Component() {
  const list = useQuery(clientsQuery());
  const me = useMe();
  const create = useCreateClient();
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const guard = useUnsavedGuard();
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Clients" lead="Profiles, daily targets, allergens and dislikes.">
        <Button
          onClick={() => {
            if (adding && !guard.drop('Close the new client? What you typed is not saved.')) return;
            setAdding((a) => !a);
          }}
          aria-expanded={adding}
        >
          {adding ? 'Close' : 'New client'}
        </Button>
      </PageHeader>
      <DemoNotice>These clients are invented demo people: names, measurements and notes are made up and are not advice.</DemoNotice>
      {adding && (
        <Card>
          <h2 className="mb-3 text-xl">New client</h2>
          <ClientForm
            unitSystem={me.unitSystem}
            initial={emptyClient}
            submitLabel="Save client"
            busy={create.isPending}
            formError={formError}
            onDirtyChange={guard.onDirtyChange}
            onSubmit={(values, setError) => {
              setFormError(null);
              create.mutate(values, {
                onSuccess: (c) => {
                  guard.allow();
                  navigate(paths.client(c.id));
                },
                onError: (e) => setFormError(applyServerErrors(e, setError, values)),
              });
            }}
          />
        </Card>
      )}
      <Card>
        <QueryView
          query={list}
          loading={<Skeleton className="h-32 w-full" />}
          isEmpty={(data) => data.length === 0}
          empty={
            <EmptyState title="No clients yet" action={<Button onClick={() => setAdding(true)}>Add your first client</Button>}>
              Add a client to compute their targets and place plates for them on the week board, or bring your list of
              clients from a spreadsheet below.
            </EmptyState>
          }
        >
          {(data) => (
            <div className="flex flex-col gap-4">
              <InviteClients clients={data.filter(isFull)} />
              <ClientList clients={data} />
            </div>
          )}
        </QueryView>
      </Card>
      <Card>
        <h2 className="mb-3 text-xl">Clients from a spreadsheet</h2>
        <ClientImport units={me.unitSystem} />
        <h2 className="mb-2 mt-6 text-xl">Keep a copy</h2>
        <p className="text-sm text-ink-soft">
          Your clients (not the archived ones) in the same columns, heights and weights in centimetres and kilograms with
          their unit: to keep, or to import into another workspace. It holds health notes and e-mail addresses: keep the
          file somewhere private.{' '}
          <a href="/api/clients.csv" download className="font-bold underline">
            Download my clients (CSV)
          </a>
        </p>
      </Card>
      <Cautions topic="diet" compact />
    </div>
  );
}
