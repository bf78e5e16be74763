import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { bakeRulesQuery, ovensQuery, weekPicksQuery } from '@/features/bake-runs/api/bake-runs.queries';
import { useCalcBakeRun, type CalcTray } from '@/features/bake-runs/api/use-bake-run-mutations';
import { BakeRunView, UnitToggle } from '@/features/bake-runs/components/bake-run-view';
import { formatTemp, type TempUnit } from '@/features/bake-runs/components/temperature';
import { useMe } from '@/features/auth/hooks/use-me';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card, EmptyState, ErrorState, Notice, PageHeader, PageSkeleton, QueryView } from '@/components/ui/states';
import { isApiError } from '@/lib/problem';
import { paths } from '@/config/paths';
import { counted } from '@/lib/words';
import { dayLabel, kitchenToday } from '@/lib/dates';
import { OvenChecks } from '@/features/bake-runs/components/oven-checks';

const todayAt8 = () => `${kitchenToday()}T08:00`;

/** The bake-run hub: open a prep week's run, or try an ad-hoc run from bake rules and tray counts. */
export function Component() {
  const me = useMe();
  const [unit, setUnit] = useState<TempUnit>(me.tempUnit);
  const rules = useQuery(bakeRulesQuery());
  const ovens = useQuery(ovensQuery());
  const weeks = useQuery(weekPicksQuery());
  const calc = useCalcBakeRun();
  const [counts, setCounts] = useState<Record<number, string>>({});
  const [chosenOvens, setChosenOvens] = useState<number[] | null>(null);
  const [start, setStart] = useState(todayAt8);
  const [cooks, setCooks] = useState('1');

  if (rules.isPending || ovens.isPending) return <PageSkeleton />;
  if (rules.isError) return <ErrorState error={rules.error} retry={() => rules.refetch()} />;
  if (ovens.isError) return <ErrorState error={ovens.error} retry={() => ovens.refetch()} />;
  const ovenIds = chosenOvens ?? ovens.data.map((o) => o.id);
  const trays: (CalcTray & { label: string })[] = rules.data.flatMap((r) =>
    Array.from({ length: Math.max(0, Math.min(50, Number(counts[r.id] ?? 0) || 0)) }, (_, k) => ({
      id: `${r.category}-${k + 1}`,
      name: `${r.label} ${k + 1}`,
      label: r.label,
      ruleId: r.id,
    })),
  );
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    calc.mutate({
      start,
      cooks: Number(cooks),
      ovens: ovens.data
        .filter((o) => ovenIds.includes(o.id))
        .map(({ name, racks, traysPerRack, convection, heatFPerMin, coolFPerMin, maxF }) => ({ name, racks, traysPerRack, convection, heatFPerMin, coolFPerMin, maxF })),
      trays: trays.map(({ label: _l, ...t }) => t),
    });
  };
  const fieldErrors = isApiError(calc.error, 400) ? calc.error.fieldErrors : {};
  const describeField = (path: string) => {
    const m = /^trays\.(\d+)\.(.+)$/.exec(path);
    return m ? `${trays[Number(m[1])]?.name ?? `Tray ${Number(m[1]) + 1}`}` : path;
  };

  return (
    <div className="flex flex-col gap-5">
      <PageHeader title="Bake run" lead="The prep-day oven schedule: which oven, rack and set point, when each tray goes in and comes out.">
        <UnitToggle unit={unit} onChange={setUnit} />
        {calc.data && (
          <Button variant="secondary" onClick={() => window.print()}>
            Print run sheet
          </Button>
        )}
      </PageHeader>

      <Card className="no-print">
        <h2 className="mb-2 text-xl">Prep weeks</h2>
        <QueryView
          query={weeks}
          loading={<p className="text-ink-soft">Loading weeks…</p>}
          isEmpty={(data) => data.length === 0}
          empty={<p className="text-ink-soft">No prep weeks yet. Try a run below.</p>}
        >
          {(data) => (
            <ul className="flex flex-col gap-1">
              {data.map((w) => (
                <li key={w.id}>
                  <Link className="inline-flex min-h-11 items-center font-bold underline" to={paths.bakeRun(w.id)}>
                    {w.name}: prep {dayLabel(w.prepDate)}
                    {w.secondPrepDate ? ` and ${dayLabel(w.secondPrepDate)}` : ''}
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </QueryView>
      </Card>

      {ovens.data.length === 0 ? (
        <EmptyState
          title="No ovens yet"
          action={
            me.role === 'coach' ? (
              <Link className="inline-flex min-h-11 items-center rounded-lg bg-ink px-4 font-bold text-paper-card" to={paths.bakeRules}>
                Add your ovens
              </Link>
            ) : undefined
          }
        >
          {me.role === 'coach' ? 'Add your ovens to plan a bake run.' : 'Ask your coach to add the ovens.'}
        </EmptyState>
      ) : (
        <form onSubmit={submit} className="no-print flex flex-col gap-4 rounded-tray bg-paper-card p-4 shadow-tray" aria-label="Try a bake run">
          <h2 className="text-xl">Try a run</h2>
          <div className="grid gap-3 sm:grid-cols-3">
            <TextField label="Start" type="datetime-local" value={start} onChange={(e) => setStart(e.target.value)} error={fieldErrors.start?.[0]} />
            <TextField label="Cooks" type="number" min={1} max={50} value={cooks} onChange={(e) => setCooks(e.target.value)} error={fieldErrors.cooks?.[0]} />
          </div>
          <OvenChecks
            legend="Ovens"
            ovens={ovens.data}
            chosen={ovenIds}
            onChange={setChosenOvens}
            detail={(o) => ` (${o.racks} × ${o.traysPerRack}${o.convection ? ', convection' : ''})`}
          />
          <fieldset className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            <legend className="mb-1 text-sm font-bold">Trays per bake rule</legend>
            {rules.data.map((r) => (
              <TextField
                key={r.id}
                label={r.label}
                hint={`${formatTemp(r.tempF, unit)}, ${r.minMinutes}–${r.maxMinutes} min, hands-on ${r.handsOnMinutes} min`}
                type="number"
                min={0}
                max={50}
                value={counts[r.id] ?? ''}
                placeholder="0"
                onChange={(e) => setCounts((c) => ({ ...c, [r.id]: e.target.value }))}
              />
            ))}
          </fieldset>
          {Object.keys(fieldErrors).length > 0 && (
            <Notice tone="block" title="This run cannot be planned">
              <ul className="list-disc pl-4">
                {Object.entries(fieldErrors).map(([path, msgs]) => (
                  <li key={path}>
                    {describeField(path)}: {msgs[0]}
                  </li>
                ))}
              </ul>
            </Notice>
          )}
          {calc.error && !isApiError(calc.error, 400) ? <ErrorState error={calc.error} /> : null}
          <div>
            <Button type="submit" busy={calc.isPending} disabled={trays.length === 0 || ovenIds.length === 0}>
              Plan {counted(trays.length, 'tray')}
            </Button>
          </div>
        </form>
      )}
      {calc.data && <BakeRunView run={calc.data} unit={unit} />}
    </div>
  );
}
