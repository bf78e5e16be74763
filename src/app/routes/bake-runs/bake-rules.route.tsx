import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { bakeRulesQuery, ovensQuery } from '@/features/bake-runs/api/bake-runs.queries';
import { useDeleteBakeRule, useDeleteOven } from '@/features/bake-runs/api/use-bake-run-mutations';
import { BakeRuleFormCard } from '@/features/bake-runs/components/bake-rule-form';
import { OvenFormCard } from '@/features/bake-runs/components/oven-form';
import { UnitToggle } from '@/features/bake-runs/components/bake-run-view';
import { formatTemp, type TempUnit } from '@/features/bake-runs/components/temperature';
import { useMe } from '@/features/auth/hooks/use-me';
import { Button, EditDeleteButtons } from '@/components/ui/button';
import { EmptyState, Notice, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { counted } from '@/lib/words';
import { deltaIn } from '@shared/domain/temperature';

/** Bake rules per food category and the workspace's ovens. The coach edits; assistants read. */
export function Component() {
  const me = useMe();
  const coach = me.role === 'coach';
  const [unit, setUnit] = useState<TempUnit>(me.tempUnit);
  const rules = useQuery(bakeRulesQuery());
  const ovens = useQuery(ovensQuery());
  const [editingRule, setEditingRule] = useState<number | 'new' | null>(null);
  const [editingOven, setEditingOven] = useState<number | 'new' | null>(null);
  const delRule = useDeleteBakeRule();
  const delOven = useDeleteOven();

  return (
    <div className="flex flex-col gap-8">
      <PageHeader title="Bake rules & ovens" lead={coach ? 'Shared by your whole team.' : 'Read only: your coach edits these.'}>
        <UnitToggle unit={unit} onChange={setUnit} />
      </PageHeader>

      <section className="flex flex-col gap-3" aria-labelledby="ovens-h">
        <div className="flex items-center justify-between gap-2">
          <h2 id="ovens-h" className="text-2xl">
            Ovens
          </h2>
          {coach && editingOven === null && <Button onClick={() => setEditingOven('new')}>Add an oven</Button>}
        </div>
        {editingOven === 'new' && <OvenFormCard oven={null} unit={unit} onDone={() => setEditingOven(null)} />}
        <QueryView
          query={ovens}
          loading={<Skeleton className="h-24 w-full" label="Loading ovens" />}
          isEmpty={(data) => data.length === 0}
          empty={<EmptyState title="No ovens yet">{coach ? 'Add the ovens of your kitchen to plan bake runs.' : 'Your coach has not added ovens yet.'}</EmptyState>}
        >
          {(data) => (
            <ul className="grid gap-3 sm:grid-cols-2">
              {data.map((o) =>
                editingOven === o.id ? (
                  <li key={o.id} className="sm:col-span-2">
                    <OvenFormCard oven={o} unit={unit} onDone={() => setEditingOven(null)} />
                  </li>
                ) : (
                  <li key={o.id} className="flex flex-col gap-2 rounded-tray bg-paper-card p-4 shadow-tray">
                    <h3 className="text-xl">{o.name}</h3>
                    <p className="num">
                      {counted(o.racks, 'rack')} × {counted(o.traysPerRack, 'tray')}
                      {o.convection ? ' · convection' : ' · conventional'} · max {formatTemp(o.maxF, unit)}
                    </p>
                    <p className="num text-sm text-ink-soft">
                      Heats {deltaIn(o.heatFPerMin, unit)}/min, cools {deltaIn(o.coolFPerMin, unit)}/min with the door ajar
                    </p>
                    {coach && (
                      <EditDeleteButtons
                        name={o.name}
                        onEdit={() => setEditingOven(o.id)}
                        onDelete={() => {
                          if (window.confirm(`Delete ${o.name}?`)) delOven.mutate(o.id);
                        }}
                      />
                    )}
                  </li>
                ),
              )}
            </ul>
          )}
        </QueryView>
      </section>

      <section className="flex flex-col gap-3" aria-labelledby="rules-h">
        <div className="flex items-center justify-between gap-2">
          <h2 id="rules-h" className="text-2xl">
            Bake rules
          </h2>
          {coach && editingRule === null && <Button onClick={() => setEditingRule('new')}>New bake rule</Button>}
        </div>
        <Notice tone="warn" title="Check doneness, not only the clock">
          Temperatures and times are common practice, not a standard. Minimum internal temperatures follow the USDA FSIS Safe
          Minimum Internal Temperatures chart; check them with a thermometer. Your local food code comes first.
        </Notice>
        {editingRule === 'new' && <BakeRuleFormCard rule={null} unit={unit} onDone={() => setEditingRule(null)} />}
        <QueryView
          query={rules}
          loading={<Skeleton className="h-48 w-full" label="Loading bake rules" />}
          isEmpty={(data) => data.length === 0}
          empty={<EmptyState title="No bake rules">{coach ? 'Add a bake rule for each kind of tray you bake.' : 'Your coach has not set bake rules.'}</EmptyState>}
        >
          {(data) => (
            <ul className="flex flex-col gap-3">
              {data.map((r) =>
                editingRule === r.id ? (
                  <li key={r.id}>
                    <BakeRuleFormCard rule={r} unit={unit} onDone={() => setEditingRule(null)} />
                  </li>
                ) : (
                  <li key={r.id} className="flex flex-col gap-1 rounded-tray bg-paper-card p-4 shadow-tray">
                    <div className="flex flex-wrap items-baseline justify-between gap-2">
                      <h3 className="text-lg">{r.label}</h3>
                      <span className="num text-lg font-bold">
                        {formatTemp(r.tempF, unit)} · {r.minMinutes}–{r.maxMinutes} min
                      </span>
                    </div>
                    <p className="text-sm text-ink-soft">{r.donenessCue}</p>
                    <p className="num text-sm">
                      Hands-on {r.handsOnMinutes} min · rack {r.rackPreference} · convection −{deltaIn(r.convectionDeltaF, unit)} · crowding +{r.crowdingPct}% per
                      extra tray
                      {r.minInternalF !== null && (
                        <>
                          {' '}
                          · internal {formatTemp(r.minInternalF, unit)}
                          {r.restMinutes ? ` + ${r.restMinutes} min rest` : ''} ({r.minInternalSource})
                        </>
                      )}
                    </p>
                    {coach && (
                      <EditDeleteButtons
                        name={r.label}
                        className="mt-1 flex gap-2"
                        onEdit={() => setEditingRule(r.id)}
                        onDelete={() => {
                          if (window.confirm(`Delete the rule "${r.label}"?`)) delRule.mutate(r.id);
                        }}
                      />
                    )}
                  </li>
                ),
              )}
            </ul>
          )}
        </QueryView>
      </section>
    </div>
  );
}
