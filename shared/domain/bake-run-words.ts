// Words about a bake run for people, kept apart from the scheduler so a page can use them without loading it.
import { clockText, DEFAULT_CLOCK, type ClockStyle } from './clock';

/**
 * What a day planned again part-way is, for people (the page's notice, the run sheet PDF): `kept` trays out of the
 * day's `total`, the rest from `from` (local "YYYY-MM-DDTHH:mm"). "7 trays already out are kept as planned, with
 * their cooling deadlines; the 3 still to bake are planned from 09:18".
 */
export function replannedSummary(from: string, kept: number, total: number, style: ClockStyle = DEFAULT_CLOCK): string {
  const left = total - kept;
  const rest =
    left > 0 ? `${left === 1 ? 'the one tray still to bake is' : `the ${left} still to bake are`} planned from ${clockText(from, style)}` : 'every tray is out';
  return `${kept === 1 ? 'one tray already out is' : `${kept} trays already out are`} kept as planned, with their cooling deadlines; ${rest}`;
}
