import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { amountAndName } from '@shared/domain/units';
import { assembliesQuery } from '@/features/assemblies/api/assemblies.queries';
import { useDeleteAssembly, useSaveAssembly } from '@/features/assemblies/api/use-assembly-mutations';
import { AssemblyForm, assemblyToInput, emptyAssembly } from '@/features/assemblies/components/assembly-form';
import { PlateMacros } from '@/features/assemblies/components/plate-macros';
import { Button, EditDeleteButtons } from '@/components/ui/button';
import { Card, EmptyState, Notice, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { errorMessage, isApiError, markShown } from '@/lib/problem';
import { useMe } from '@/features/auth/hooks/use-me';
import { DemoNotice } from '@/features/auth/components/demo-notice';
import { FILTER_FROM, ListFilter } from '@/components/ui/list-filter';
import { filterByText } from '@/lib/words';
import { allergenLabel } from '@shared/domain/allergens';

function Editor({ plate, onDone }: { plate: AssemblyDto | null; onDone: () => void }) {
  const save = useSaveAssembly(plate?.id ?? null);
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Card>
      <h2 className="mb-3 text-xl">{plate ? `Edit ${plate.name}` : 'New plate'}</h2>
      <AssemblyForm
        key={plate ? `${plate.id}-${plate.version}` : 'new'}
        initial={plate ? assemblyToInput(plate) : emptyAssembly}
        names={Object.fromEntries((plate?.addOns ?? []).map((a) => [a.ingredientId, a.ingredientName]))}
        trayNames={Object.fromEntries((plate?.trays ?? []).map((t) => [t.trayId, t.trayName]))}
        busy={save.isPending}
        formError={formError}
        onSubmit={(values, setError) => {
          setFormError(null);
          save.mutate(plate ? { ...values, version: plate.version } : values, {
            onSuccess: onDone,
            onError: (e) => {
              markShown(e);
              setFormError(isApiError(e, 409) ? 'Someone else changed this plate: close and open it again to see their version.' : applyServerErrors(e, setError));
            },
          });
        }}
      />
    </Card>
  );
}

export function Component() {
  const me = useMe();
  const list = useQuery(assembliesQuery());
  const del = useDeleteAssembly();
  const [editing, setEditing] = useState<AssemblyDto | 'new' | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [find, setFind] = useState('');
  const coach = me.role === 'coach';
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Plates" lead="Portions of base trays plus add-ons, with their macros, allergens and steps.">
        {coach && <Button onClick={() => setEditing(editing ? null : 'new')}>{editing ? 'Close' : 'New plate'}</Button>}
      </PageHeader>
      <DemoNotice>These plates are invented demo data for trying Trayline; their numbers come from the demo base trays.</DemoNotice>
      {editing && <Editor plate={editing === 'new' ? null : editing} onDone={() => setEditing(null)} />}
      {error && <Notice tone="block" title={error} />}
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
        {(data) => {
          const shown = filterByText(data, find, (p) => [p.name, ...p.allergens.map(allergenLabel), ...p.trays.map((t) => t.trayName), ...p.addOns.map((x) => x.ingredientName)]);
          return (
            <>
              {data.length >= FILTER_FROM && (
                <ListFilter label="Find a plate" placeholder="name, base tray, add-on or allergen" value={find} onChange={setFind} shown={shown.length} total={data.length} />
              )}
              {shown.length === 0 ? (
                <p className="text-ink-soft">No plate matches “{find.trim()}”.</p>
              ) : (
                <ul className="grid gap-4 md:grid-cols-2">
                  {shown.map((p) => (
                    <li key={p.id}>
                      <Card className="flex h-full flex-col gap-2">
                        <h2 className="text-xl">{p.name}</h2>
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
                          <EditDeleteButtons
                            name={p.name}
                            className="mt-auto flex gap-2"
                            onEdit={() => setEditing(p)}
                            onDelete={() => {
                              if (!window.confirm(`Delete the plate "${p.name}"? A plate planned on a week board is kept.`)) return;
                              setError(null);
                              // A plate on a board is refused with where it is planned (the server's words).
                              del.mutate(p.id, { onError: (e) => setError(errorMessage(e)) });
                            }}
                          />
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
