import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { publishedAllergensQuery } from '@/features/clients/api/clients.queries';
import { CheckFailed, Notice } from '@/components/ui/states';
import { kitchenToday } from '@/lib/dates';
import { AllergenPlates } from '@/components/domain/allergen-plates';
import { counted } from '@/lib/words';
import { paths } from '@/config/paths';

/**
 * On a client's profile: the published plates, from today on, that hold an allergen put on the client's list after
 * the week was published (a published week is what the client reads until the next publication). Says nothing while
 * it loads or when there are none; a failed check says so, with a retry.
 */
export function PublishedAllergens({ clientId, name }: { clientId: number; name: string }) {
  const q = useQuery(publishedAllergensQuery(clientId, kitchenToday()));
  if (q.isError) return <CheckFailed title="Could not check the published weeks against this client’s allergens" retry={() => void q.refetch()} />;
  const weeks = q.data ?? [];
  const count = weeks.reduce((n, w) => n + w.plates.length, 0);
  if (!count) return null;
  return (
    <Notice tone="block" title={`${counted(count, 'published plate')} from today on ${count === 1 ? 'holds' : 'hold'} an allergen now on ${name}’s list`}>
      {weeks.map((w) => (
        <div key={w.weekId} className="mt-2">
          <Link to={paths.week(w.weekId)} className="font-bold underline">
            {w.weekName}
          </Link>{' '}
          (published version {w.publishedVersion})
          <AllergenPlates plates={w.plates} />
          <Link to={paths.weekSend(w.weekId, [clientId])} className="mt-1 inline-flex min-h-11 items-center font-bold underline">
            E-mail {name} this week’s plan again
          </Link>
        </div>
      ))}
      <p className="mt-2">
        They were published before it was on the list. {name}’s phone and plan PDF say not to eat them before asking you; the plan sent again by
        e-mail says so beside each plate, for a client who does not open the app. Change them on the week board, or allow the allergen there with a
        reason, then publish again.
      </p>
    </Notice>
  );
}
