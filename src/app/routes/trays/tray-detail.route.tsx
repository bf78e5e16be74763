import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router-dom';
import { trayQuery } from '@/features/trays/api/trays.queries';
import { useDeleteTray, useDuplicateTray, useUpdateTray } from '@/features/trays/api/use-tray-mutations';
import { TrayEditor } from '@/features/trays/components/tray-editor';
import { PortionCard } from '@/features/trays/components/portion-card';
import { TrayShopping } from '@/features/shopping/components/tray-shopping';
import { ScalePanel } from '@/features/trays/components/scale-panel';
import { RecipeCard } from '@/features/trays/components/recipe-card';
import { PhotoUpload } from '@/features/trays/components/photo-upload';
import { trayToValues } from '@/features/trays/components/tray-form-values';
import { useMe } from '@/features/auth/hooks/use-me';
import { Button } from '@/components/ui/button';
import { Card, ErrorState, Notice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';

/** One base tray: the editor (coach) or the recipe (assistant, client), the portion card, scaling and a print view. */
export function Component() {
  const { trayId } = useParams();
  const id = Number(trayId);
  const me = useMe();
  const q = useQuery(trayQuery(id));
  const update = useUpdateTray(id);
  const duplicate = useDuplicateTray();
  const del = useDeleteTray();
  const navigate = useNavigate();
  const [view, setView] = useState<'edit' | 'card'>(me.role === 'coach' ? 'edit' : 'card');
  const [notice, setNotice] = useState<string | null>(null);
  // Archived or restored here while the editor holds typing: the editor's Save, sent from the version before, goes
  // on the version after (this coach's own change, not someone else's: no stale notice).
  const [ownChange, setOwnChange] = useState<{ from: number; to: number } | null>(null);

  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const tray = q.data;
  const isCoach = me.role === 'coach';

  const setArchived = (archived: boolean) => {
    const before = tray.version;
    update.mutate(
      { ...trayToValues(tray), version: before, archived },
      {
        onSuccess: (after) => {
          setOwnChange((c) => ({ from: c && c.to === before ? c.from : before, to: after.version }));
          setNotice(archived ? 'Archived.' : 'Restored.');
        },
      },
    );
  };
  const versionFor = (version: number | undefined) => (version === undefined ? tray.version : version === ownChange?.from ? ownChange.to : version);

  return (
    <div className="flex flex-col gap-6">
      <PageHeader title={tray.name} lead={`${tray.portions} portions · ${tray.pan.label}${tray.archived ? ' · archived' : ''}`}>
        {isCoach && (
          <div role="tablist" aria-label="View" className="flex gap-1">
            <Button role="tab" aria-selected={view === 'edit'} variant={view === 'edit' ? 'primary' : 'secondary'} onClick={() => setView('edit')}>
              Edit
            </Button>
            <Button role="tab" aria-selected={view === 'card'} variant={view === 'card' ? 'primary' : 'secondary'} onClick={() => setView('card')}>
              Recipe card
            </Button>
          </div>
        )}
        <Button variant="secondary" onClick={() => window.print()}>
          Print recipe card
        </Button>
        {isCoach && (
          <>
            <Button
              variant="secondary"
              busy={duplicate.isPending}
              onClick={() => duplicate.mutate(id, { onSuccess: (copy) => navigate(paths.tray(copy.id)) })}
            >
              Duplicate
            </Button>
            {tray.archived ? (
              <Button variant="secondary" onClick={() => setArchived(false)}>
                Restore
              </Button>
            ) : (
              <Button
                variant="danger"
                busy={del.isPending}
                onClick={() => {
                  if (!window.confirm(`Delete “${tray.name}”? A tray used by a plan is archived instead.`)) return;
                  del.mutate(id, {
                    onSuccess: (res) => (res?.archived ? setNotice('A plan uses this tray, so it was archived instead.') : navigate(paths.trays)),
                  });
                }}
              >
                Delete
              </Button>
            )}
          </>
        )}
      </PageHeader>
      {notice && <Notice tone="info" title={notice} />}
      {tray.isDemo && <Notice tone="info" title="Demo tray">Invented for trying Trayline; amounts and times are illustrative.</Notice>}
      {view === 'edit' && isCoach && (
        // On paper the recipe card comes first, as it does in the card view (the editor does not print).
        <div className="hidden print:block">
          <RecipeCard tray={tray} system={me.unitSystem} />
        </div>
      )}
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <div className={`flex flex-col gap-6 ${view === 'edit' && isCoach ? 'print:hidden' : ''}`}>
          {view === 'edit' && isCoach ? (
            <TrayEditor
              key={`${tray.id}`}
              initial={tray}
              busy={update.isPending}
              onSave={(values, version) => update.mutateAsync({ ...values, version: versionFor(version) })}
              onSaved={() => setNotice('Saved.')}
            />
          ) : (
            <RecipeCard tray={tray} system={me.unitSystem} />
          )}
        </div>
        <div className="flex flex-col gap-6">
          <Card className="print:hidden">
            <PhotoUpload tray={tray} canEdit={isCoach} />
          </Card>
          <PortionCard trayId={tray.id} />
          <Card className="print:hidden">
            <h2 className="mb-3 text-xl">To buy for this tray</h2>
            <TrayShopping trayId={tray.id} />
          </Card>
        </div>
      </div>
      <ScalePanel tray={tray} system={me.unitSystem} />
    </div>
  );
}
