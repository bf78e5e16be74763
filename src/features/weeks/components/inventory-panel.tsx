import { useState } from 'react';
import type { BoardDto, PutTraysInput } from '@shared/schemas/weeks.schema';
import { Button } from '@/components/ui/button';
import { dayLabel } from '@/lib/dates';
import { counted } from '@/lib/words';

/** Each base tray's count per prep day, keyed "trayId|prepDate". */
const trayCounts = (board: Pick<BoardDto, 'trays'>) => new Map(board.trays.map((t) => [`${t.trayId}|${t.prepDate}`, t.trayCount]));

/** Every tray count of `board` with the typed ones put over it: what a save of typed counts sends (the API replaces all). */
export function countsWithTyped(board: Pick<BoardDto, 'trays'>, typed: Map<string, number>): PutTraysInput['trays'] {
  const all = new Map([...trayCounts(board), ...typed]);
  return [...all.entries()].map(([k, trayCount]) => ({ trayId: Number(k.split('|')[0]), prepDate: k.split('|')[1], trayCount }));
}

/**
 * The board's one-line portion count: what is short, else whether the trays bake more than the board needs. A tray
 * count above the trays that cover its prep day's need bakes whole trays nobody eats (a copied week, plates moved
 * away); the spare of the last tray is the cut plan's and is not counted as extra.
 */
export function portionSummary(board: Pick<BoardDto, 'inventory' | 'trays'>): { tone: 'warn' | 'info'; title: string; detail?: string } {
  const short = board.inventory.reduce((s, t) => s + t.short, 0);
  if (short) return { tone: 'warn', title: `${counted(short, 'portion')} short` };
  const counts = trayCounts(board);
  let extraTrays = 0;
  for (const t of board.inventory) {
    for (const p of t.byPrepDate) {
      if (p.traysToCover === null) continue;
      extraTrays += Math.max(0, (counts.get(`${t.trayId}|${p.prepDate}`) ?? 0) - p.traysToCover);
    }
  }
  const needed = board.inventory.reduce((s, t) => s + t.needed, 0);
  if (!needed) {
    return extraTrays
      ? { tone: 'warn', title: `${counted(extraTrays, 'tray')} to bake, no plate uses them`, detail: 'Place plates on the board, or set the tray counts to 0.' }
      : { tone: 'info', title: 'No portions needed yet', detail: 'Place plates on the board to count portions.' };
  }
  const spare = board.inventory.reduce((s, t) => s + t.spare, 0);
  if (extraTrays) {
    return {
      tone: 'warn',
      title: `Every portion is baked, with ${counted(extraTrays, 'tray')} more than the board needs`,
      detail: `${counted(spare, 'spare portion')} in all. "Set tray counts to cover the need" bakes only what the plates use.`,
    };
  }
  return { tone: 'info', title: 'Every portion is baked', detail: spare ? `${counted(spare, 'spare portion')} from cutting whole trays.` : undefined };
}

/**
 * Portions needed (cells × household) against portions baked (tray counts × cut plan, less the trays the cooling
 * record has thrown away), per tray and prep day.
 */
export function InventoryPanel({
  board,
  busy,
  onCover,
  onSave,
}: {
  board: BoardDto;
  busy: boolean;
  onCover: () => void;
  /** The counts typed (`trayId|prepDate` → trays), and the board version they were typed on. */
  onSave: (typed: Map<string, number>, version: number) => void;
}) {
  const names = new Map(board.trays.map((t) => [t.trayId, t.name]));
  for (const p of board.plates) for (const t of p.trays) names.set(t.trayId, t.trayName);
  const counts = trayCounts(board);
  const [draft, setDraft] = useState<Record<string, string>>({});
  // The board version the first count was typed on: a save from it is refused (409) when someone else changed the week.
  const [draftVersion, setDraftVersion] = useState<number | null>(null);
  const rows = board.inventory.flatMap((t) => t.byPrepDate.map((p) => ({ trayId: Number(t.trayId), ...p })));
  const save = () => {
    onSave(new Map(Object.entries(draft).map(([k, v]) => [k, Math.max(0, Math.floor(Number(v) || 0))])), draftVersion ?? board.week.version);
    setDraft({});
    setDraftVersion(null);
  };
  if (!rows.length) return <p className="text-ink-soft">Place plates on the board to count portions.</p>;
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead>
            <tr className="border-b border-line text-ink-faint">
              <th className="py-2">Base tray</th>
              <th>Prep day</th>
              <th className="text-right">Needed</th>
              <th className="text-right">Trays</th>
              <th className="text-right">Baked</th>
              <th className="text-right">Short / spare</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const key = `${r.trayId}|${r.prepDate}`;
              return (
                <tr key={key} className="border-b border-line">
                  <td className="py-2 font-bold">{names.get(r.trayId) ?? `Tray ${r.trayId}`}</td>
                  <td>{dayLabel(r.prepDate)}</td>
                  <td className="num text-right">{r.needed}</td>
                  <td className="text-right">
                    <input
                      aria-label={`Trays of ${names.get(r.trayId)} on ${dayLabel(r.prepDate)}`}
                      inputMode="numeric"
                      className="num w-16 rounded border border-line-strong bg-paper-card px-2 py-1 text-right"
                      value={draft[key] ?? String(counts.get(key) ?? 0)}
                      onChange={(e) => {
                        setDraft({ ...draft, [key]: e.target.value });
                        setDraftVersion((v) => v ?? board.week.version);
                      }}
                    />
                  </td>
                  <td className="num text-right">
                    {r.produced}
                    {r.lostTrays > 0 && <span className="block text-xs text-signal-700">{counted(r.lostTrays, 'tray')} thrown away</span>}
                  </td>
                  <td className={`num text-right font-bold ${r.short ? 'text-signal-700' : 'text-herb-700'}`}>
                    {r.short ? `⚠ ${r.short} short` : `${r.spare} spare`}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap gap-2">
        <Button size="sm" variant="secondary" disabled={busy || !Object.keys(draft).length} onClick={save}>
          Save tray counts
        </Button>
        <Button size="sm" busy={busy} onClick={onCover}>
          Set tray counts to cover the need
        </Button>
      </div>
    </div>
  );
}
