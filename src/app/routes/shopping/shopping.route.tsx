import { Link, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { shoppingCsvUrl, shoppingListQuery, shoppingPdfUrl } from '@/features/shopping/api/shopping.queries';
import { useMarkBought } from '@/features/shopping/api/use-shopping-mutations';
import { money, ShoppingList } from '@/features/shopping/components/shopping-list';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, Notice, PageHeader, PageSkeleton, Progress } from '@/components/ui/states';
import { paths } from '@/config/paths';

const linkButton =
  'inline-flex min-h-11 items-center justify-center rounded-lg border border-line-strong bg-paper-card px-4 font-bold text-ink hover:bg-paper-deep';

/** The week's shopping list: phone-first for the assistant (big tap targets, aisle groups, checked items sink). */
export function Component() {
  const weekId = Number(useParams().weekId);
  const q = useQuery(shoppingListQuery(weekId));
  const bought = useMarkBought(weekId);

  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const list = q.data;

  const markBought = () => {
    if (window.confirm('Mark everything bought? The pantry keeps the spare of each package and gives up what this list used. This happens once per week.')) {
      bought.mutate();
    }
  };

  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-5 print:max-w-none">
      <PageHeader
        title="Shopping list"
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
        <a className={linkButton} href={shoppingCsvUrl(weekId)} download>
          CSV
        </a>
        <a className={linkButton} href={shoppingPdfUrl(weekId)} download>
          PDF
        </a>
        <Link className={linkButton} to={paths.pantry}>
          Pantry
        </Link>
      </PageHeader>

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
            The pantry was updated on {new Date(list.bought.at).toLocaleString()}
            {list.bought.by ? ` by ${list.bought.by}` : ''}.
          </Notice>
        ) : (
          list.itemCount > 0 && (
            <Button variant="secondary" busy={bought.isPending} onClick={markBought}>
              Mark all bought and update the pantry
            </Button>
          )
        )}
        <p className="text-sm text-ink-faint">
          Packages are rounded up; costs are estimates from the ingredient library's prices. Keep cold food cold on the
          way home and refrigerate it within 2 hours (1 hour above 90 °F).
        </p>
      </div>
    </div>
  );
}
