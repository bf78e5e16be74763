import { useState } from 'react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { Button } from '@/components/ui/button';
import { DayOptions, SelectField } from '@/components/ui/field';
import { Card } from '@/components/ui/states';
import { dayLabel } from '@/lib/dates';
import { agrees, counted } from '@/lib/words';
import { andList } from '@shared/domain/words';

/**
 * What copying one day onto another did, read from the board the copy answered with (the day copied from is as it
 * was): how many meals went over, and which stayed behind because their plate is archived (the server leaves them out).
 */
export function copyDaySummary(board: Pick<BoardDto, 'cells' | 'plates'>, from: string, to: string): string {
  const cells = board.cells.filter((c) => c.date === from);
  const archived = new Map(board.plates.filter((p) => p.archived).map((p) => [p.id, p.name]));
  const behind = cells.filter((c) => archived.has(c.assemblyId));
  const copied = cells.length - behind.length;
  const said =
    copied > 0 ? `Copied ${dayLabel(from)} to ${dayLabel(to)}: ${counted(copied, 'meal')}.` : `Copied ${dayLabel(from)} to ${dayLabel(to)}: ${dayLabel(to)} has no meals now.`;
  if (behind.length === 0) return said;
  const plates = [...new Set(behind.map((c) => `"${archived.get(c.assemblyId)}"`))];
  return `${said} ${counted(behind.length, 'meal')} stayed behind: ${andList(plates)} ${agrees(plates.length, 'is', 'are')} archived.`;
}

/** "Copy a day": every client's plates of one day onto another, replacing it; says what it copied. */
export function CopyDayCard({
  board,
  busy,
  onCopy,
}: {
  board: BoardDto;
  busy: boolean;
  /** Sends the copy; `done` is called with the board the server answered once it has made it. */
  onCopy: (fromDate: string, toDate: string, done: (answer: BoardDto) => void) => void;
}) {
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const [said, setSaid] = useState('');
  return (
    <Card>
      <h2 className="mb-1 text-xl">Copy a day</h2>
      <p className="mb-3 text-sm text-ink-soft">Every client's plates of one day onto another; archived plates stay behind.</p>
      <form
        className="grid items-end gap-3 sm:grid-cols-[1fr_1fr_auto]"
        aria-label="Copy a day"
        onSubmit={(e) => {
          e.preventDefault();
          if (!from || !to) return;
          setSaid('');
          onCopy(from, to, (answer) => setSaid(copyDaySummary(answer, from, to)));
        }}
      >
        <SelectField
          label="From"
          value={from}
          onChange={(e) => {
            setFrom(e.target.value);
            setSaid('');
          }}
        >
          <option value="">Choose…</option>
          <DayOptions days={board.days} />
        </SelectField>
        <SelectField
          label="To (replaces that day)"
          value={to}
          onChange={(e) => {
            setTo(e.target.value);
            setSaid('');
          }}
        >
          <option value="">Choose…</option>
          <DayOptions days={board.days} />
        </SelectField>
        <Button type="submit" variant="secondary" busy={busy} disabled={!from || !to || from === to}>
          Copy day
        </Button>
      </form>
      <p role="status" className="mt-2 text-base">
        {said}
      </p>
    </Card>
  );
}
