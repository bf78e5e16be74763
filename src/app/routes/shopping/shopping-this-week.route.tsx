import { CurrentWeekRedirect } from '@/features/shopping/components/current-week-redirect';
import { paths } from '@/config/paths';

/** "Shopping list" in the navigation: this week's list. */
export function Component() {
  return <CurrentWeekRedirect to={(id) => paths.shopping(id)} what="shopping list" />;
}
