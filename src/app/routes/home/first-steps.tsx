import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import type { SetupCountsDto } from '@shared/schemas/weeks.schema';
import { Card, ErrorState, Progress, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { glanceQuery } from '@/features/weeks/api/weeks.queries';
import { kitchenToday } from '@/lib/dates';

interface Step {
  count: keyof SetupCountsDto;
  title: string;
  why: string;
  to: string;
  action: string;
}

/** The order a new workspace is set up in: each step needs the one before it, except the ovens. */
const STEPS: Step[] = [
  { count: 'trays', title: 'Write a base tray', why: 'Its ingredients, pan and cut plan give every portion its numbers.', to: paths.trayNew, action: 'New base tray' },
  { count: 'plates', title: 'Make a plate', why: 'Portions of base trays plus add-ons: what a client eats at one meal.', to: paths.plates, action: 'Plates' },
  { count: 'clients', title: 'Add your clients', why: 'Their targets, allergens and dislikes are what each day is checked against.', to: paths.clients, action: 'Clients' },
  { count: 'ovens', title: 'Describe your ovens', why: 'The bake run fits the trays into them.', to: paths.bakeRules, action: 'Bake rules & ovens' },
  { count: 'weeks', title: 'Plan a week', why: 'Place plates on the week board, cover the portions, publish it to your clients.', to: paths.weeks, action: 'Week board' },
];

/**
 * The coach's first steps in a new workspace, each ticked off once the workspace has one (the counts come with the
 * home glance: one read shared with "This week at a glance"). Gone once every step is done.
 */
export function FirstSteps() {
  const q = useQuery(glanceQuery(kitchenToday()));
  if (q.isPending) return <Skeleton className="h-40 w-full" label="Loading your first steps" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => void q.refetch()} />;
  const setup = q.data.setup;
  const done = STEPS.map((s) => setup[s.count] > 0);
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
