import { Link } from 'react-router-dom';
import type { UseQueryResult } from '@tanstack/react-query';
import type { WeekPublishedAllergensDto } from '@shared/schemas/weeks.schema';
import { AllergenPlates } from '@/components/domain/allergen-plates';
import { CheckFailed, Notice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { counted } from '@/lib/words';

/** How many plates the published version holds with an allergen put on a client's list since. */
const clashCount = (d: WeekPublishedAllergensDto | undefined) => (d?.clients ?? []).reduce((n, c) => n + c.plates.length, 0);

/**
 * On a week's page: the published version's plates, from today on, holding an allergen put on a client's list after
 * publishing (what the clients follow until the next version). Nothing while it loads or when there are none; a failed
 * check says so, with a retry.
 */
export function PublishedAllergenClashes({ query, changedSince = false }: { query: UseQueryResult<WeekPublishedAllergensDto>; changedSince?: boolean }) {
  if (query.isError) return <CheckFailed title="Could not check the published version against the clients’ allergens" retry={() => void query.refetch()} />;
  const count = clashCount(query.data);
  if (!query.data || !count) return null;
  const { publishedVersion, clients } = query.data;
  return (
    <Notice
      tone="block"
      title={`Published version ${publishedVersion}: ${counted(count, 'plate')} from today on ${count === 1 ? 'holds' : 'hold'} an allergen put on ${
        clients.length === 1 ? `${clients[0].name}’s list` : `${clients.length} clients’ lists`
      } since`}
    >
      {clients.map((c) => (
        <div key={c.clientId} className="mt-2">
          <Link to={paths.client(c.clientId)} className="font-bold underline">
            {c.name}
          </Link>
          <AllergenPlates plates={c.plates} />
        </div>
      ))}
      <p className="mt-2">
        Their phones and plan PDFs say not to eat these before asking you. Change them on the board, or allow the allergen there with a reason, then
        publish a new version.
        {changedSince && ` The board has changed since version ${publishedVersion}: if those changes take care of them, publish a new version now.`}
      </p>
    </Notice>
  );
}
