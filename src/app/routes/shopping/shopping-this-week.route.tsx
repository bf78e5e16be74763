import { nextTripOf } from '@shared/domain/week-board';
import { CurrentWeekRedirect } from '@/features/shopping/components/current-week-redirect';
import { lastKeptList } from '@/features/shopping/api/use-shopping-mutations';
import { localToday } from '@/lib/dates';
import { paths } from '@/config/paths';

/** "Shopping list" in the navigation: this week's list (in a week with two prep days, the next prep day's). */
export function Component() {
  return (
    <CurrentWeekRedirect
      to={(w) => paths.shopping(w.id, nextTripOf(w, localToday()))}
      what="shopping list"
      title="Shopping list"
      sayWhenPassed
      kept={() => {
        const last = lastKeptList();
        return last && { path: paths.shopping(last.weekId, last.prepDate), savedAt: last.savedAt };
      }}
    />
  );
}
