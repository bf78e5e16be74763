import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { UseFormSetError } from 'react-hook-form';
import type { AssemblyDto, AssemblyInput, AssemblyValues } from '@shared/schemas/assemblies.schema';
import { amountAndName } from '@shared/domain/units';
import { assembliesQuery } from '@/features/assemblies/api/assemblies.queries';
import { useArchiveAssembly, useDeleteAssembly, useSaveAssembly } from '@/features/assemblies/api/use-assembly-mutations';
import { AssemblyForm, assemblyToInput, emptyAssembly } from '@/features/assemblies/components/assembly-form';
import { PlateMacros } from '@/features/assemblies/components/plate-macros';
import { Button, EditDeleteButtons } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { Card, EmptyState, Notice, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { NewerVersionNotice, StaleEditNotice } from '@/components/ui/stale-edit-notice';
import { useEditBase } from '@/lib/use-edit-base';
import { applyServerErrors } from '@/lib/form-errors';
import { errorMessage, isApiError, markShown } from '@/lib/problem';
import { useMe } from '@/features/auth/hooks/use-me';
import { DemoNotice } from '@/features/auth/components/demo-notice';
import { FILTER_FROM, ListFilter } from '@/components/ui/list-filter';
import { filterByText } from '@/lib/words';
import { allergenLabel } from '@shared/domain/allergens';
import { useTellBoth, useUnsavedGuard } from '@/lib/use-unsaved-guard';

/** Saves a plate from the editor: field errors land on the form, a stale save (409 with theirs) goes to `onStale`. */
function usePlateSave(id: number | null, onDone: () => void, onStale?: (values: AssemblyValues, current: AssemblyDto) => void) {
  const save = useSaveAssembly(id);
  const [formError, setFormError] = useState<string | null>(null);
  const send = (values: AssemblyValues, version: number | undefined, setError?: UseFormSetError<AssemblyInput>) => {
    setFormError(null);
    save.mutate(version !== undefined ? { ...values, version } : values, {
      onSuccess: onDone,
      onError: (e) => {
        markShown(e);
        if (onStale && isApiError(e, 409) && e.problem.code === 'stale_version' && e.problem.current) {
          onStale(values, e.problem.current as AssemblyDto);
          return;
        }
        setFormError(isApiError(e, 409) ? errorMessage(e) : setError ? applyServerErrors(e, setError, values) : errorMessage(e));
      },
    });
  };
  return { send, formError, busy: save.isPending };
}

function NewPlate({ onDone, onDirtyChange }: { onDone: () => void; onDirtyChange: (dirty: boolean) => void }) {
  const { send, formError, busy } = usePlateSave(null, onDone);
  return (
    <Card>
      <h2 className="mb-3 text-xl">New plate</h2>
      <AssemblyForm initial={emptyAssembly} busy={busy} formError={formError} onDirtyChange={onDirtyChange} onSubmit={(values, setError) => send(values, undefined, setError)} />
    </Card>
  );
}

/** This coach's own archive or restore of a plate (from its card): typing in its editor carries over. */
interface OwnPlateChange {
  id: number;
  before: number;
  /** The plate saved; null when the change failed; undefined while it is under way. */
  after?: AssemblyDto | null;
}

function EditPlate({ plate, own, onDone, onDirtyChange }: { plate: AssemblyDto; own: OwnPlateChange | null; onDone: () => void; onDirtyChange: (dirty: boolean) => void }) {
  // The version the form's typing started from: follows the newest while nothing is typed; someone else's save
  // meanwhile leaves it (and what was typed) until the coach reloads theirs or saves this over it.
  const edit = useEditBase<AssemblyDto, AssemblyValues>(plate);
  const tellBoth = useTellBoth(edit.onDirtyChange, onDirtyChange);
  const { send, formError, busy } = usePlateSave(plate.id, onDone, edit.refused);
  const [seen, setSeen] = useState(own);
  if (own !== seen) {
    setSeen(own);
    if (own?.id === plate.id) {
      if (own.after === undefined) edit.carrying(own.before);
      else edit.carried(own.before, own.after);
    }
  }
  const { base, held } = edit;
  return (
    <Card>
      <h2 className="mb-3 text-xl">Edit {base.name}</h2>
      {held ? (
        <div className="mb-3">
          <StaleEditNotice what="plate" version={held.current.version} busy={busy} onReload={edit.reload} onKeep={() => send(held.values, held.current.version)} />
        </div>
      ) : (
        edit.newerElsewhere && (
          <div className="mb-3">
            <NewerVersionNotice what="plate" version={edit.newerElsewhere.version} onReload={edit.reload} />
          </div>
        )
      )}
      <AssemblyForm
        key={base.version}
        initial={assemblyToInput(base)}
        names={Object.fromEntries(base.addOns.map((a) => [a.ingredientId, a.ingredientName]))}
        trayNames={Object.fromEntries(base.trays.map((t) => [t.trayId, t.trayName]))}
        busy={busy}
        formError={formError}
        onDirtyChange={tellBoth}
        onSubmit={(values, setError) => send(values, edit.sendVersion, setError)}
      />
    </Card>
  );
}

/** What archiving does, said where the coach archives. */
const ARCHIVE_MEANS = 'An archived plate leaves this list and the week board’s pickers; the boards and plans that name it keep it. Restore it any time.';

export function Component() {
  const me = useMe();
  const list = useQuery(assembliesQuery());
  const del = useDeleteAssembly();
  const archive = useArchiveAssembly();
  const [editing, setEditing] = useState<AssemblyDto | 'new' | null>(null);
  const [own, setOwn] = useState<OwnPlateChange | null>(null);
  const guard = useUnsavedGuard();
  /** Opens another plate's editor, a new one, or none: typing in the open one is dropped only when the coach says so. */
  const openEditor = (next: AssemblyDto | 'new' | null) => {
    const what = editing === 'new' ? 'the new plate' : `“${editing?.name}”`;
    if (editing && !guard.drop(`Drop what you typed in ${what}? It is not saved.`)) return;
    setEditing(next);
  };
  /** Saved: the editor closes (nothing typed is left behind). */
  const saved = () => {
    guard.onDirtyChange(false);
    setEditing(null);
  };
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [find, setFind] = useState('');
  const [show, setShow] = useState<'current' | 'archived'>('current');
  const coach = me.role === 'coach';
  const setArchived = (p: AssemblyDto, archived: boolean) => {
    setError(null);
    setNotice(null);
    setOwn({ id: p.id, before: p.version });
    archive.mutate(
      { id: p.id, archived, version: p.version },
      {
        onSettled: (after) => setOwn({ id: p.id, before: p.version, after: after ?? null }),
        onSuccess: () => setNotice(archived ? `Archived “${p.name}”. ${ARCHIVE_MEANS}` : `Restored “${p.name}”: it is back in the list and the board’s pickers.`),
        onError: (e) => {
          markShown(e);
          setError(isApiError(e, 409) ? 'Someone else changed this plate meanwhile: the list now shows their version; try again.' : errorMessage(e));
        },
      },
    );
  };
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Plates" lead="Portions of base trays plus add-ons, with their macros, allergens and steps.">
        {coach && <Button onClick={() => openEditor(editing ? null : 'new')}>{editing ? 'Close' : 'New plate'}</Button>}
      </PageHeader>
      <DemoNotice>These plates are invented demo data for trying Trayline; their numbers come from the demo base trays.</DemoNotice>
      {editing === 'new' ? (
        <NewPlate onDone={saved} onDirtyChange={guard.onDirtyChange} />
      ) : (
        editing && (
          // The newest the list holds (a refetch on focus, this coach's archive), keyed by plate: Edit on another plate opens that one.
          <EditPlate key={editing.id} plate={list.data?.find((p) => p.id === editing.id) ?? editing} own={own} onDone={saved} onDirtyChange={guard.onDirtyChange} />
        )
      )}
      {error && <Notice tone="block" title={error} />}
      {notice && (
        // Scrolled into view: the card that was clicked may be far down the list (or gone from it).
        <p role="status" ref={(el) => el?.scrollIntoView?.({ block: 'nearest' })} className="scroll-mt-20 rounded-lg border border-line bg-paper-card p-3 text-sm">
          {notice}
        </p>
      )}
      <QueryView
        query={list}
        loading={<Skeleton className="h-40 w-full" />}
        isEmpty={(data) => data.length === 0}
        empty={
          <EmptyState title="No plates yet" action={coach ? <Button onClick={() => setEditing('new')}>Make a plate</Button> : undefined}>
            A plate combines portions of base trays with add-ons such as a low-carb wrap or a spoon of cream cheese.
          </EmptyState>
        }
      >
        {(all) => {
          const archivedCount = all.filter((p) => p.archived).length;
          const view = archivedCount ? show : 'current';
          const data = all.filter((p) => p.archived === (view === 'archived'));
          const shown = filterByText(data, find, (p) => [p.name, ...p.allergens.map(allergenLabel), ...p.trays.map((t) => t.trayName), ...p.addOns.map((x) => x.ingredientName)]);
          return (
            <>
              {(archivedCount > 0 || data.length >= FILTER_FROM) && (
                <div className="flex flex-wrap items-end gap-3">
                  {archivedCount > 0 && (
                    <SelectField label="Show" value={view} onChange={(e) => setShow(e.target.value as 'current' | 'archived')} className="max-w-xs">
                      <option value="current">Current plates ({all.length - archivedCount})</option>
                      <option value="archived">Archived plates ({archivedCount})</option>
                    </SelectField>
                  )}
                  {data.length >= FILTER_FROM && (
                    <ListFilter label="Find a plate" placeholder="name, base tray, add-on or allergen" value={find} onChange={setFind} shown={shown.length} total={data.length} />
                  )}
                </div>
              )}
              {data.length === 0 ? (
                <p className="text-ink-soft">{view === 'archived' ? 'No archived plates.' : 'Every plate is archived: choose “Archived plates” to restore one, or make a new plate.'}</p>
              ) : shown.length === 0 ? (
                <p className="text-ink-soft">No plate matches “{find.trim()}”.</p>
              ) : (
                <ul className="grid gap-4 md:grid-cols-2">
                  {shown.map((p) => (
                    <li key={p.id}>
                      <Card className="flex h-full flex-col gap-2">
                        <h2 className="text-xl">
                          {p.name}
                          {p.archived && <span className="ml-2 rounded bg-paper-deep px-1 align-middle text-xs font-bold text-ink-soft">Archived</span>}
                        </h2>
                        <PlateMacros macros={p.macros} allergens={p.allergens} />
                        {!p.complete && <Notice tone="warn" title="Some parts could not be weighed: their nutrients are left out." />}
                        <ul className="list-disc pl-5 text-sm">
                          {p.trays.map((t) => (
                            <li key={`t${t.trayId}`}>
                              {t.portions} × {t.trayName}
                            </li>
                          ))}
                          {p.addOns.map((a, i) => (
                            <li key={`a${i}`}>
                              {amountAndName(a.amountText, a.unit, a.ingredientName, me.unitSystem)} {a.note && <span className="text-ink-faint">({a.note})</span>}
                            </li>
                          ))}
                        </ul>
                        {coach && (
                          <div className="mt-auto flex flex-wrap gap-2">
                            <EditDeleteButtons
                              name={p.name}
                              onEdit={() => (editing !== 'new' && editing?.id === p.id ? undefined : openEditor(p))}
                              onDelete={() => {
                                if (!window.confirm(`Delete the plate "${p.name}"? A plate planned on a week board is archived instead.`)) return;
                                setError(null);
                                setNotice(null);
                                del.mutate(p.id, {
                                  // A plate on a board is archived instead: say where it is planned (the server's words).
                                  onSuccess: (res) => res?.archived && setNotice(`“${p.name}” is planned for ${res.plannedOn}, so it was archived instead. ${ARCHIVE_MEANS}`),
                                  onError: (e) => setError(errorMessage(e)),
                                });
                              }}
                            />
                            <Button size="sm" variant="ghost" busy={archive.isPending && archive.variables?.id === p.id} onClick={() => setArchived(p, !p.archived)} aria-label={`${p.archived ? 'Restore' : 'Archive'} ${p.name}`}>
                              {p.archived ? 'Restore' : 'Archive'}
                            </Button>
                          </div>
                        )}
                      </Card>
                    </li>
                  ))}
                </ul>
              )}
            </>
          );
        }}
      </QueryView>
    </div>
  );
}
