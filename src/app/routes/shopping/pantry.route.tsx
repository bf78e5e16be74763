import { useQuery } from '@tanstack/react-query';
import { pantryQuery } from '@/features/shopping/api/shopping.queries';
import { AddPantryItem, PantryRow } from '@/features/shopping/components/pantry-forms';
import { Card, EmptyState, ErrorState, PageHeader, PageSkeleton } from '@/components/ui/states';

/** What the kitchen has on hand: the shopping list subtracts it before rounding to packages. */
export function Component() {
  const q = useQuery(pantryQuery());
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-5">
      <PageHeader title="Pantry" lead="What is on hand. Shopping lists buy only the rest, and 'mark bought' keeps the spare." />
      <Card>
        <h2 className="mb-3 text-xl">Add what you have</h2>
        <AddPantryItem />
      </Card>
      {q.isPending ? (
        <PageSkeleton />
      ) : q.isError ? (
        <ErrorState error={q.error} retry={() => q.refetch()} />
      ) : q.data.items.length === 0 ? (
        <EmptyState title="The pantry is empty">Add what is already on the shelf so the shopping list does not buy it again.</EmptyState>
      ) : (
        <ul className="flex flex-col gap-2" aria-label="On hand">
          {q.data.items.map((item) => (
            <PantryRow key={`${item.id}-${item.version}`} item={item} />
          ))}
        </ul>
      )}
    </div>
  );
}
