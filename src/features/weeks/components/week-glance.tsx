import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { glanceQuery } from '../api/weeks.queries';
import { Card, ErrorState, Notice, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { agrees, counted } from '@/lib/words';
import { dayLabel, kitchenToday, nextPrepDayTitle } from '@/lib/dates';
import type { GlanceDto } from '@shared/schemas/weeks.schema';
import { addDays, compareIsoDates, daysBetween } from '@shared/domain/iso-date';
import { BOARD_DAYS } from '@shared/domain/week-days';

/** Trays the cooling record has thrown away or past a deadline: the coach decides what to bake again or change. */
function CoolingTrouble({ weekId, cooling }: { weekId: number; cooling: GlanceDto['cooling'] | undefined }) {
  if (!cooling || cooling.thrownAway.length + cooling.missed.length === 0) return null;
  const said = [
    cooling.thrownAway.length ? `${counted(cooling.thrownAway.length, 'tray')} thrown away` : '',
    cooling.missed.length ? `${counted(cooling.missed.length, 'tray')} past a cooling deadline` : '',
  ].filter(Boolean);
  const line = (t: GlanceDto['cooling']['missed'][number], what: string) => (
    <li key={`${what}-${t.prepDate}-${t.trayName}`}>
      {t.trayName}, prep {dayLabel(t.prepDate)}: {what} ·{' '}
      <Link to={`${paths.bakeRun(weekId)}?prepDate=${t.prepDate}`} className="font-bold underline">
        cooling record
      </Link>
    </li>
  );
  return (
    <div className="mt-3">
      <Notice tone="block" title={`Cooling record: ${said.join(', ')}`}>
        <ul className="list-disc pl-4">
          {cooling.thrownAway.map((t) => line(t, 'thrown away; its portions no longer count as baked'))}
          {cooling.missed.map((t) => line(t, 'no reading shows it cooled by its Food Code deadline'))}
        </ul>
      </Notice>
    </div>
  );
}

/** The first day of the board that covers `today` in the ended week's rhythm (its boards start on the same weekday). */
function thisWeekStart(endDate: string, today: string): string {
  const gone = daysBetween(addDays(endDate, 1), today);
  return addDays(endDate, 1 + gone - (gone % BOARD_DAYS));
}

/** The coach's "this week at a glance": warnings, portions short, the next prep day, cooling trouble. */
export function WeekGlance() {
  // The kitchen's day (its time zone when set, else this device's): the week, the next prep day and "from today on".
  const today = kitchenToday();
  const q = useQuery(glanceQuery(today));
  if (q.isPending) return <Skeleton className="h-28 w-full" label="Loading this week" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const g = q.data;
  if (!g.week) return null;
  // The week read is today's, else the next to start, else the latest (which then has ended).
  if (compareIsoDates(g.week.endDate, today) < 0) {
    return (
      <Card>
        <h2 className="mb-3 text-xl">This week at a glance</h2>
        <Notice tone="warn" title="Nothing planned for this week">
          <p>
            The latest week,{' '}
            <Link to={paths.week(g.week.id)} className="underline">
              {g.week.name}
            </Link>
            , ended on {dayLabel(g.week.endDate, true)}. Clients see no plate for today until a week that covers it is published.
          </p>
          <Link to={`${paths.weeks}?from=${g.week.id}&start=${thisWeekStart(g.week.endDate, today)}`} className="inline-flex min-h-11 items-center font-bold underline">
            Plan this week from a copy of it
          </Link>
        </Notice>
      </Card>
    );
  }
  const ahead = compareIsoDates(today, g.week.startDate) < 0;
  return (
    <Card>
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-xl">{ahead ? `Coming up: from ${dayLabel(g.week.startDate, true)}` : 'This week at a glance'}</h2>
        <Link to={paths.week(g.week.id)} className="font-bold underline">
          {g.week.name}
        </Link>
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        <Notice tone={g.blocks ? 'block' : g.warnings ? 'warn' : 'info'} title={counted(g.blocks + g.warnings, 'warning')}>
          {/* The board's problems: they stop the next publication; clients keep the version published. */}
          {g.blocks ? `${g.blocks} ${agrees(g.blocks, 'blocks', 'block')} publishing${g.week.publishedVersion ? ' a new version' : ''}` : 'None blocks publishing'}
        </Notice>
        <Notice tone={g.portionsShort ? 'warn' : 'info'} title={g.portionsShort ? `${counted(g.portionsShort, 'portion')} short` : 'No portion short'} />
        <Notice tone="cold" title={g.nextPrepDate ? nextPrepDayTitle(g.nextPrepDate, today) : 'No prep day ahead'} />
      </div>
      {g.publishedAllergens.plates > 0 && (
        <div className="mt-3">
          <Notice
            tone="block"
            title={`Published version ${g.week.publishedVersion}: ${counted(g.publishedAllergens.plates, 'plate')} from today on ${
              g.publishedAllergens.plates === 1 ? 'holds' : 'hold'
            } an allergen put on ${g.publishedAllergens.clients === 1 ? 'a client’s list' : `${g.publishedAllergens.clients} clients’ lists`} since`}
          >
            Their phones and plan PDFs say not to eat them before asking you.{' '}
            <Link to={paths.week(g.week.id)} className="font-bold underline">
              See which on the week
            </Link>
          </Notice>
        </div>
      )}
      <CoolingTrouble weekId={g.week.id} cooling={g.cooling} />
      <p className="mt-3">
        {g.nextWeek ? (
          <>
            After it:{' '}
            <Link to={paths.week(g.nextWeek.id)} className="font-bold underline">
              {g.nextWeek.name}
            </Link>{' '}
            · {g.nextWeek.publishedVersion ? `published v${g.nextWeek.publishedVersion}` : 'draft'} · {counted(g.nextWeek.cellCount, 'plate')} placed
          </>
        ) : (
          <>
            Nothing planned after this week yet.{' '}
            <Link to={`${paths.weeks}?from=${g.week.id}`} className="inline-flex min-h-11 items-center font-bold underline">
              Plan the next week from this one
            </Link>
          </>
        )}
      </p>
    </Card>
  );
}
