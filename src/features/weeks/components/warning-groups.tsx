import { warningGroups, type WarningGroup, type WarningKind, type WeekWarning } from '@shared/domain/week-check';
import { andList, compareNames } from '@shared/domain/words';
import { allergenLabel } from '@shared/domain/allergens';
import { counted } from '@/lib/words';

/** What a group of problems is, with its count: days for a day's totals, meals for a planned plate (an allergen: groupWords). */
const WHAT: Record<Exclude<WarningKind, 'allergen'>, (n: number) => string> = {
  'net-carbs-over': (n) => `${counted(n, 'day')} over the net-carb cap`,
  'protein-short': (n) => `${counted(n, 'day')} short of protein`,
  'energy-over': (n) => `${counted(n, 'day')} over the energy limit`,
  dislike: (n) => `${counted(n, 'meal')} with a dislike`,
  'past-eat-by': (n) => `${counted(n, 'meal')} past the eat-by date`,
  'before-prep': (n) => `${counted(n, 'meal')} before the tray is made`,
  'past-freezer-quality': (n) => `${counted(n, 'meal')} past the freezer quality limit`,
};

/** "2 meals holding milk, on the client’s allergen list, allowed by the coach: Ana Diaz and Bo Lee". */
export function groupWords(g: WarningGroup, clientName: (id: string) => string): string {
  const names = g.clientIds.map(clientName).sort(compareNames);
  const whose = names.length <= 3 ? andList(names) : andList([...names.slice(0, 2), counted(names.length - 2, 'other client')]);
  // warningGroups puts each allergen in a group of its own.
  const what =
    g.kind === 'allergen'
      ? `${counted(g.count, 'meal')} holding ${g.allergen ? allergenLabel(g.allergen).toLowerCase() : 'an allergen'}, on the client’s allergen list`
      : WHAT[g.kind](g.count);
  return `${what}${g.allowed ? ', allowed by the coach' : ''}: ${whose}`;
}

/**
 * A long list of problems by kind (a board of many clients): how many of each and whose, and the way to the board's
 * clients with something flagged, where each is marked on its day.
 */
export function WarningGroups({ warnings, clientName, onShowFlagged }: { warnings: readonly WeekWarning[]; clientName: (id: string) => string; onShowFlagged: () => void }) {
  return (
    <>
      <ul className="list-disc pl-5">
        {warningGroups(warnings).map((g) => (
          <li key={`${g.kind}|${g.allergen}|${g.allowed}`}>{groupWords(g, clientName)}</li>
        ))}
      </ul>
      <p>
        Each is flagged on its day on the board.{' '}
        <button type="button" className="min-h-11 font-bold underline" onClick={onShowFlagged}>
          Show only those clients
        </button>
      </p>
    </>
  );
}
