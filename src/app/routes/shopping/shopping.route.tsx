import { useEffect } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { shoppingCsvUrl, shoppingListQuery, shoppingPdfUrl } from '@/features/shopping/api/shopping.queries';
import { keptListName, useMarkBought } from '@/features/shopping/api/use-shopping-mutations';
import { useMe } from '@/features/auth/hooks/use-me';
import { forgetAnswer, keptNames } from '@/lib/device-copy';
import { useKeptAnswer } from '@/lib/use-kept-answer';
import { useOnline } from '@/lib/online';
import { ShoppingList } from '@/features/shopping/components/shopping-list';
import { money } from '@/lib/money';
import { Button, linkButton } from '@/components/ui/button';
import { EmptyState, ErrorState, KeptCopyNotice, Notice, PageHeader, PageSkeleton, Progress } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/problem';
import { dayLabel, momentLabel } from '@/lib/dates';
import { useTempScale } from '@/lib/temp-scale';
import { bothScales } from '@shared/domain/temperature';
import { HOT_DAY_THRESHOLD_F } from '@shared/domain/eat-by';


const tripButton = (on: boolean) =>
  `inline-flex min-h-11 items-center rounded-lg border px-3 font-bold ${on ? 'border-ink bg-ink text-paper-card' : 'border-line-strong bg-paper-card text-ink hover:bg-paper-deep'}`;

/**
 * A week with two prep days is shopped twice: the whole week's list, or the trip before each prep day (`?for=` the
 * prep date), each with its own check marks.
 */
function TripChoice({ weekId, tripDates, prepDate }: { weekId: number; tripDates: string[]; prepDate: string | null }) {
  return (
    <nav aria-label="Which list" className="flex flex-col gap-2 print:hidden">
      <div className="flex flex-wrap gap-2">
        <Link to={paths.shopping(weekId)} className={tripButton(prepDate === null)} aria-current={prepDate === null ? 'page' : undefined}>
          Whole week
        </Link>
        {tripDates.map((d) => (
          <Link key={d} to={paths.shopping(weekId, d)} className={tripButton(prepDate === d)} aria-current={prepDate === d ? 'page' : undefined}>
            For prep {dayLabel(d)}
          </Link>
        ))}
      </div>
      <p className="text-sm text-ink-soft">
        Two prep days: shop for each from its own list (its trays and the plates it supplies). The pantry goes to the
        first trip first. Each list keeps its own check marks.
      </p>
    </nav>
  );
}

/** The week's shopping list: phone-first for the assistant (big tap targets, aisle groups, checked items sink). */
export function Component() {
  const weekId = Number(useParams().weekId);
  const [params] = useSearchParams();
  const prepDate = params.get('for') || null;
  const me = useMe();
  const online = useOnline();
  const query = shoppingListQuery(weekId, prepDate);
  const q = useQuery(query);
  const bought = useMarkBought(weekId, prepDate);
  const scale = useTempScale();
  // Kept on the device, so the list opens in a store with no signal (one week's lists: another week's are let go).
  const kept = keptListName(weekId, prepDate);
  const { fromDevice, seeding } = useKeptAnswer(q, query.queryKey, kept, me);
  useEffect(() => {
    if (q.isSuccess) for (const n of keptNames('shopping:')) if (!n.startsWith(`shopping:${weekId}:`)) forgetAnswer(n);
  }, [q.isSuccess, weekId]);

  if (q.data === undefined) return q.isError && !seeding ? <ErrorState error={q.error} retry={() => q.refetch()} /> : <PageSkeleton />;
  const list = q.data;
  // What the page says about where the list comes from when it is not the server's answer of a moment ago.
  const source =
    fromDevice !== null ? (
      <KeptCopyNotice what="list" savedAt={fromDevice} online={online} retry={() => void q.refetch()} retrying={q.isFetching}>
        Ticks are kept on this device and sent once you are back online; changes made elsewhere since then show then too.
      </KeptCopyNotice>
    ) : (
      q.isError && (
        <Notice tone="warn" title="Could not read the list again">
          <p>{errorMessage(q.error)} It shows as it was last read.</p>
          <p className="mt-2">
            <Button variant="secondary" busy={q.isFetching} onClick={() => void q.refetch()}>
              Try again
            </Button>
          </p>
        </Notice>
      )
    );
  const trip = list.prepDate ? `the list for prep ${dayLabel(list.prepDate)}` : list.tripDates.length ? "the whole week's list" : 'the list';

  const markBought = () => {
    if (window.confirm(`Mark everything on ${trip} bought? The pantry keeps the spare of each package and gives up what this list used. This happens once per list.`)) {
      bought.mutate();
    }
  };

  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-5 print:max-w-none">
      <PageHeader
        title={list.prepDate ? `Shopping list for prep ${dayLabel(list.prepDate)}` : 'Shopping list'}
        lead={
          <span className="num">
            {list.checkedCount} of {list.itemCount} checked · estimated {money(list.totalCostCents)}
            {!list.costComplete && ' or more (some items have no price)'}
          </span>
        }
      >
        <Button variant="secondary" onClick={() => window.print()}>
          Print
        </Button>
        {/* Files come from the server: offered while it can be reached. */}
        {online && fromDevice === null && (
          <>
            <a className={linkButton} href={shoppingCsvUrl(weekId, list.prepDate)} download>
              CSV
            </a>
            <a className={linkButton} href={shoppingPdfUrl(weekId, list.prepDate)} download>
              PDF
            </a>
          </>
        )}
        <Link className={linkButton} to={paths.pantry}>
          Pantry
        </Link>
      </PageHeader>

      {source}
      {list.tripDates.length > 0 && <TripChoice weekId={weekId} tripDates={list.tripDates} prepDate={list.prepDate} />}
      {list.alsoBought.length > 0 && (
        <Notice tone="warn" title="Another list of this week was marked bought">
          {list.alsoBought.map((b) => `${b.prepDate ? `The list for prep ${dayLabel(b.prepDate)}` : "The whole week's list"} on ${momentLabel(b.at)}`).join('; ')}
          . The pantry now holds what it bought, and this list counts on it.
        </Notice>
      )}

      <div className="print:hidden">
        <Progress value={list.checkedCount} max={list.itemCount} label="Checked off" />
      </div>

      {list.problems.length > 0 && (
        <Notice tone="warn" title="Some amounts could not be counted">
          <ul className="list-disc pl-5">
            {list.problems.map((p) => (
              <li key={`${p.ingredientId}-${p.message}`}>
                {p.name}: {p.message}
              </li>
            ))}
          </ul>
        </Notice>
      )}

      {list.itemCount === 0 ? (
        <EmptyState title="Nothing to buy yet">Set tray counts and fill the week board: the list adds up every tray and every add-on.</EmptyState>
      ) : (
        <ShoppingList list={list} weekId={weekId} />
      )}

      <div className="flex flex-col gap-3 border-t border-line pt-4 print:hidden">
        {list.bought ? (
          <Notice tone="info" title="Marked bought">
            The pantry was updated on {momentLabel(list.bought.at)}
            {list.bought.by ? ` by ${list.bought.by}` : ''}.
          </Notice>
        ) : (
          list.itemCount > 0 && (
            <Button variant="secondary" busy={bought.isPending} onClick={markBought}>
              Mark all bought and update the pantry
            </Button>
          )
        )}
        {bought.isError && (
          <Notice tone="block" title="Not marked bought">
            {errorMessage(bought.error)}
          </Notice>
        )}
        <p className="text-sm text-ink-faint">
          Packages are rounded up; costs are estimates from the ingredient library's prices. Keep cold food cold on the
          way home and refrigerate it within 2 hours (1 hour above {bothScales(HOT_DAY_THRESHOLD_F, scale)}).
        </p>
      </div>
    </div>
  );
}
