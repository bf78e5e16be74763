import { useState } from 'react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { errorMessage, isApiError } from '@/lib/problem';

/**
 * The week's prep days. `error` is the last save's failure: a field's 400 shows under that field, any other refusal
 * (such as a prep day's list already bought) in the card; a stale version is the board's merge prompt, not shown here.
 */
export function PrepDates({
  board,
  busy,
  error,
  onSave,
}: {
  board: BoardDto;
  busy: boolean;
  error: unknown;
  /** The dates, and the board version they were typed on (a 409 when someone else changed the week since). */
  onSave: (prep: string, second: string | null, version: number) => void;
}) {
  // What was typed, on the version it was typed on; with nothing typed the fields show the board as it is now (a
  // refresh brings someone else's dates in). Dropped once the board holds the typed dates (saved).
  const [draft, setDraft] = useState<{ prep: string; second: string; version: number } | null>(null);
  const now = { prep: board.week.prepDate, second: board.week.secondPrepDate ?? '' };
  if (draft && draft.prep === now.prep && draft.second === now.second) setDraft(null);
  const { prep, second } = draft ?? now;
  const type = (change: Partial<{ prep: string; second: string }>) => setDraft({ prep, second, ...change, version: draft?.version ?? board.week.version });
  const stale = isApiError(error, 409) && error.problem.code === 'stale_version';
  const fields = isApiError(error, 400) ? error.fieldErrors : {};
  const refusal = error && !stale && !fields.prepDate && !fields.secondPrepDate ? (isApiError(error) ? error.message : errorMessage(error)) : null;
  return (
    <form
      className="grid items-start gap-3 sm:grid-cols-[1fr_1fr_auto]"
      onSubmit={(e) => {
        e.preventDefault();
        onSave(prep, second || null, draft?.version ?? board.week.version);
      }}
    >
      <TextField label="Prep day" type="date" value={prep} error={fields.prepDate?.[0]} onChange={(e) => type({ prep: e.target.value })} />
      <TextField
        label="Second prep day (optional)"
        type="date"
        value={second}
        error={fields.secondPrepDate?.[0]}
        onChange={(e) => type({ second: e.target.value })}
        hint="Fresher portions for the end of the week. Cleared, its tray counts join the first prep day’s."
      />
      {/* Level with the date inputs (below their labels), whatever the hints and errors under them. */}
      <div className="sm:pt-6">
        <Button type="submit" variant="secondary" busy={busy}>
          Save prep days
        </Button>
      </div>
      {refusal && (
        <div className="sm:col-span-3">
          <Notice tone="block" title="Prep days not changed">
            {refusal}
          </Notice>
        </div>
      )}
    </form>
  );
}
