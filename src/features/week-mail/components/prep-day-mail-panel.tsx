import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { PREP_NOTE_MAX, type PrepDayMailResultDto } from '@shared/schemas/prep-day-mail.schema';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { errorMessage } from '@/lib/problem';
import { paths } from '@/config/paths';
import { dayLabel } from '@/lib/dates';
import { useSendPrepDay } from '../api/use-send-prep-day';

/**
 * E-mails a prep day's shopping list and bake run (PDFs made when each mail leaves, in each reader's measures) to
 * the kitchen assistants. One request id per press of Send: a retry after a lost answer queues nothing twice.
 */
export function PrepDayMailPanel({ board }: { board: BoardDto }) {
  const send = useSendPrepDay(board.week.id);
  const [prepDate, setPrepDate] = useState(board.prepDates[0]);
  const [note, setNote] = useState('');
  const [requestId, setRequestId] = useState<string | null>(null);
  const [result, setResult] = useState<PrepDayMailResultDto | null>(null);
  const [error, setError] = useState<string | null>(null);
  const submit = () => {
    const id = requestId ?? crypto.randomUUID();
    setRequestId(id);
    setError(null);
    setResult(null);
    send.mutate(
      { prepDate, requestId: id, ...(note.trim() ? { note } : {}) },
      {
        onSuccess: (r) => {
          setResult(r);
          setRequestId(null);
        },
        onError: (e) => setError(errorMessage(e)),
      },
    );
  };
  // A new request once the coach changes what is sent.
  const changed = <T,>(set: (v: T) => void) => (v: T) => {
    set(v);
    setRequestId(null);
  };
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <p className="text-sm text-ink-soft">
        Each kitchen assistant gets an e-mail with the prep day&apos;s shopping list and bake run as PDFs, made when the e-mail leaves and in
        their own measures.
      </p>
      <div className="grid gap-3 sm:grid-cols-[16rem_1fr]">
        {board.prepDates.length > 1 ? (
          <SelectField label="For prep day" value={prepDate} onChange={(e) => changed(setPrepDate)(e.target.value)}>
            {board.prepDates.map((d) => (
              <option key={d} value={d}>
                {dayLabel(d, true)}
              </option>
            ))}
          </SelectField>
        ) : (
          <p className="self-end font-bold">Prep day {dayLabel(prepDate, true)}</p>
        )}
        <TextAreaField label="Note for the kitchen (optional)" rows={2} maxLength={PREP_NOTE_MAX} value={note} onChange={(e) => changed(setNote)(e.target.value)} />
      </div>
      <div>
        <Button type="submit" variant="secondary" busy={send.isPending}>
          E-mail the shopping list and bake run
        </Button>
      </div>
      {result && (
        <Notice tone="info" title={result.repeated ? 'Already on its way' : `Queued for ${result.recipients.length === 1 ? 'one assistant' : `${result.recipients.length} assistants`}`}>
          {result.recipients.map((r) => `${r.name} (${r.email})`).join(', ')}. Follow it in the <Link to={paths.outbox} className="underline">outbox</Link>.
        </Notice>
      )}
      {error && (
        <Notice tone="block" title="Not sent">
          {error}
        </Notice>
      )}
    </form>
  );
}
