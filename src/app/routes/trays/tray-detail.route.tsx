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
import { useEditBase } from '@/lib/use-edit-base';
import { errorMessage, isApiError } from '@/lib/problem';
import type { TrayDto, TrayValues } from '@shared/schemas/trays.schema';
import { Button } from '@/components/ui/button';
import { Card, ErrorState, Notice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useTellBoth, useUnsavedGuard } from '@/lib/use-unsaved-guard';

/** One base tray: the editor (coach) or the recipe (assistant, client), the portion card, scaling and a print view. */
export function Component() {
  const { trayId } = useParams();
  const id = Number(trayId);
  const q = useQuery(trayQuery(id));
  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  // Keyed by the tray: a duplicate opens on the same route, and must not keep the edit state of the one it came from.
  return <TrayPage key={q.data.id} tray={q.data} />;
}

function TrayPage({ tray }: { tray: TrayDto }) {
  const id = tray.id;
  const me = useMe();
  const update = useUpdateTray(id);
  const duplicate = useDuplicateTray();
  const del = useDeleteTray();
  const navigate = useNavigate();
  const [view, setView] = useState<'edit' | 'card'>(me.role === 'coach' ? 'edit' : 'card');
  const [notice, setNotice] = useState<string | null>(null);
  const [archiveError, setArchiveError] = useState<string | null>(null);
  // The version the editor's typing started from: follows the newest while nothing is typed; this coach's own archive
  // or restore carries the typing over (their change, not someone else's: no stale notice).
  const edit = useEditBase<TrayDto, TrayValues>(tray);
  const guard = useUnsavedGuard();
  const onDirtyChange = useTellBoth(edit.onDirtyChange, guard.onDirtyChange);
  const isCoach = me.role === 'coach';

  const setArchived = (archived: boolean) => {
    setNotice(null);
    setArchiveError(null);
    const before = tray.version;
    edit.carrying(before);
    update.mutate(
      { ...trayToValues(tray), version: before, archived },
      {
        onSettled: (after) => edit.carried(before, after ?? null),
        onSuccess: () => setNotice(archived ? 'Archived.' : 'Restored.'),
        // The save is not toasted (the editor shows its own errors): say here why nothing changed.
        onError: (e) =>
          setArchiveError(
            isApiError(e, 409)
              ? `Not ${archived ? 'archived' : 'restored'}: someone else changed this tray meanwhile, and the page now shows their version. Try again if you still mean to.`
              : `Not ${archived ? 'archived' : 'restored'}: ${errorMessage(e)}`,
          ),
      },
    );
  };

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
                    onSuccess: (res) => {
                      if (res?.archived) return setNotice('A plan uses this tray, so it was archived instead.');
                      guard.allow();
                      navigate(paths.trays);
                    },
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
      {archiveError && <Notice tone="block" title={archiveError} />}
      {tray.isDemo && <Notice tone="info" title="Demo tray">Invented for trying Trayline; amounts and times are illustrative.</Notice>}
      {view === 'edit' && isCoach && (
        // On paper the recipe card comes first, as it does in the card view (the editor does not print).
        <div className="hidden print:block">
          <RecipeCard tray={tray} system={me.unitSystem} />
        </div>
      )}
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <div className={`flex flex-col gap-6 ${view === 'edit' && isCoach ? 'print:hidden' : ''}`}>
          {isCoach && (
            // Kept mounted while the recipe card is looked at: what was typed is still there on coming back.
            <div hidden={view !== 'edit'}>
              <TrayEditor
                edit={edit}
                busy={update.isPending}
                onSave={(values, version) => update.mutateAsync({ ...values, version: version ?? edit.sendVersion })}
                onSaved={() => setNotice('Saved.')}
                onDirtyChange={onDirtyChange}
              />
            </div>
          )}
          {(view === 'card' || !isCoach) && <RecipeCard tray={tray} system={me.unitSystem} />}
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
