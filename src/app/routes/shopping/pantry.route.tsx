import { useQuery } from '@tanstack/react-query';
import { pantryQuery } from '@/features/shopping/api/shopping.queries';
import { AddPantryItem, PantryRow } from '@/features/shopping/components/pantry-forms';
import { useMe } from '@/features/auth/hooks/use-me';
import { Card, EmptyState, PageHeader, QueryView } from '@/components/ui/states';

/** What the kitchen has on hand: the shopping list subtracts it before rounding to packages. */
export function Component() {
  const q = useQuery(pantryQuery());
  const { unitSystem } = useMe();
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-5">
      <PageHeader title="Pantry" lead="What is on hand. Shopping lists buy only the rest, and 'mark bought' keeps the spare." />
      <Card>
        <h2 className="mb-3 text-xl">Add what you have</h2>
        <AddPantryItem unitSystem={unitSystem} />
      </Card>
      <QueryView
        query={q}
        isEmpty={(d) => d.items.length === 0}
        empty={<EmptyState title="The pantry is empty">Add what is already on the shelf so the shopping list does not buy it again.</EmptyState>}
      >
        {(d) => (
          <ul className="flex flex-col gap-2" aria-label="On hand">
            {d.items.map((item) => (
              <PantryRow key={item.id} item={item} unitSystem={unitSystem} />
            ))}
          </ul>
        )}
      </QueryView>
    </div>
  );
}
