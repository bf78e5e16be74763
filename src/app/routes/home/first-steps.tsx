import { Link } from 'react-router-dom';
import { useQueries } from '@tanstack/react-query';
import { Card, ErrorState, Progress, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { traysQuery } from '@/features/trays/api/trays.queries';
import { assembliesQuery } from '@/features/assemblies/api/assemblies.queries';
import { clientsQuery } from '@/features/clients/api/clients.queries';
import { ovensQuery } from '@/features/bake-runs/api/bake-runs.queries';
import { weeksQuery } from '@/features/weeks/api/weeks.queries';

interface Step {
  title: string;
  why: string;
  to: string;
  action: string;
}

/** The order a new workspace is set up in: each step needs the one before it, except the ovens. */
const STEPS: Step[] = [
  { title: 'Write a base tray', why: 'Its ingredients, pan and cut plan give every portion its numbers.', to: paths.trayNew, action: 'New base tray' },
  { title: 'Make a plate', why: 'Portions of base trays plus add-ons: what a client eats at one meal.', to: paths.plates, action: 'Plates' },
  { title: 'Add your clients', why: 'Their targets, allergens and dislikes are what each day is checked against.', to: paths.clients, action: 'Clients' },
  { title: 'Describe your ovens', why: 'The bake run fits the trays into them.', to: paths.bakeRules, action: 'Bake rules & ovens' },
  { title: 'Plan a week', why: 'Place plates on the week board, cover the portions, publish it to your clients.', to: paths.weeks, action: 'Week board' },
];

/**
 * The coach's first steps in a new workspace, each ticked off once the workspace has one (read from the same
 * lists the pages use). Gone once every step is done.
 */
export function FirstSteps() {
  const results = useQueries({ queries: [traysQuery({}), assembliesQuery(), clientsQuery(), ovensQuery(), weeksQuery()] });
  if (results.some((r) => r.isPending)) return <Skeleton className="h-40 w-full" label="Loading your first steps" />;
  const failed = results.find((r) => r.isError);
  if (failed) return <ErrorState error={failed.error} retry={() => results.forEach((r) => void r.refetch())} />;
  const done = results.map((r) => ((r.data as unknown[] | undefined)?.length ?? 0) > 0);
  const count = done.filter(Boolean).length;
  if (count === STEPS.length) return null;
  const next = done.indexOf(false);
  return (
    <Card>
      <h2 className="mb-1 text-xl">First steps</h2>
      <p className="mb-3 text-sm text-ink-soft">Set up your workspace in this order; each step is ticked off once it is done.</p>
      <Progress value={count} max={STEPS.length} label="Steps done" />
      <ol className="mt-4 flex flex-col gap-2">
        {STEPS.map((s, i) => (
          <li
            key={s.title}
            className={`flex flex-wrap items-center gap-3 rounded-lg border px-3 py-2 ${i === next ? 'border-ink bg-paper' : 'border-line bg-paper-card'}`}
          >
            <span aria-hidden className={`grid h-7 w-7 shrink-0 place-items-center rounded-full text-sm font-bold ${done[i] ? 'bg-herb text-paper-card' : 'border border-line-strong'}`}>
              {done[i] ? '✓' : i + 1}
            </span>
            <div className="min-w-0 flex-1">
              <p className={`font-bold ${done[i] ? 'text-ink-soft line-through decoration-1' : ''}`}>
                {s.title}
                <span className="sr-only">{done[i] ? ' (done)' : ' (to do)'}</span>
              </p>
              <p className="text-sm text-ink-soft">{s.why}</p>
            </div>
            {!done[i] && (
              <Link
                to={s.to}
                className={`inline-flex min-h-11 items-center rounded-lg px-3 font-bold ${i === next ? 'bg-ink text-paper-card hover:bg-ink-soft' : 'border border-line-strong hover:bg-paper-deep'}`}
              >
                {s.action}
              </Link>
            )}
          </li>
        ))}
      </ol>
    </Card>
  );
}
