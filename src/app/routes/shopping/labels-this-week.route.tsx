import { CurrentWeekRedirect } from '@/features/shopping/components/current-week-redirect';
import { paths } from '@/config/paths';

/** "Labels" in the navigation: this week's label sheet. */
export function Component() {
  return <CurrentWeekRedirect to={(w) => paths.labels(w.id)} what="label sheet" title="Container labels" />;
}
