import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { UseQueryResult } from '@tanstack/react-query';
import type { MemberDto } from '@shared/schemas/auth.schema';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { PREP_ALSO_TO_MAX, PREP_NOTE_MAX, type PrepDayMailResultDto } from '@shared/schemas/prep-day-mail.schema';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { errorMessage, isApiError } from '@/lib/problem';
import { counted } from '@/lib/words';
import { paths } from '@/config/paths';
import { dayLabel } from '@/lib/dates';
import { useSendPrepDay } from '../api/use-send-prep-day';

/** The addresses typed in one field, split at commas, semicolons, spaces and new lines. */
export const addressesOf = (text: string) => text.split(/[\s,;]+/).filter(Boolean);

/**
 * E-mails a prep day's shopping list and bake run (PDFs made when each mail leaves, in each reader's measures) to
 * the kitchen assistants chosen (all by default) and to other addresses (a kitchen's shared inbox). One request id
 * per press of Send: a retry after a lost answer queues nothing twice. `team`: the workspace's people (the page reads
 * them).
 */
export function PrepDayMailPanel({ board, team }: { board: BoardDto; team: UseQueryResult<MemberDto[]> }) {
  const send = useSendPrepDay(board.week.id);
  const assistants = (team.data ?? []).filter((m) => m.role === 'assistant');
  // Which prep day (first or second): the week's prep days can move under the page, and the choice goes with them.
  const [picked, setPicked] = useState(0);
  const prepDate = board.prepDates[picked] ?? board.prepDates[0];
  const setPrepDate = (date: string) => setPicked(Math.max(0, board.prepDates.indexOf(date)));
  const [note, setNote] = useState('');
  // Left out (user ids): an assistant who joins later is in by default.
  const [leftOut, setLeftOut] = useState<number[]>([]);
  const [others, setOthers] = useState('');
  const [requestId, setRequestId] = useState<string | null>(null);
  const [result, setResult] = useState<PrepDayMailResultDto | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string[]>>({});
  const submit = () => {
    const id = requestId ?? crypto.randomUUID();
    setRequestId(id);
    setError(null);
    setFieldErrors({});
    setResult(null);
    const alsoTo = addressesOf(others);
    send.mutate(
      {
        prepDate,
        requestId: id,
        ...(note.trim() ? { note } : {}),
        // Until the team is read, the server's default (every assistant) stands.
        ...(team.data ? { assistantIds: assistants.map((a) => a.userId).filter((u) => !leftOut.includes(u)) } : {}),
        ...(alsoTo.length ? { alsoTo } : {}),
      },
      {
        onSuccess: (r) => {
          setResult(r);
          setRequestId(null);
        },
        onError: (e) => {
          if (isApiError(e, 400)) setFieldErrors(e.fieldErrors);
          setError(errorMessage(e));
        },
      },
    );
  };
  const addressError = Object.entries(fieldErrors).find(([k]) => k.startsWith('alsoTo'));
  const addressMessage = addressError && (/^alsoTo\.\d+$/.test(addressError[0]) ? `${addressesOf(others)[Number(addressError[0].split('.')[1])] ?? 'An address'}: ${addressError[1][0]}` : addressError[1][0]);
  const chooseError = Object.entries(fieldErrors).find(([k]) => k.startsWith('assistantIds'))?.[1][0];
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
        Each person chosen gets an e-mail with the prep day&apos;s shopping list and bake run as PDFs, made when the e-mail leaves and in their
        own measures.
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
      <div className="grid gap-3 sm:grid-cols-[16rem_1fr]">
        <fieldset className="flex flex-col gap-1" aria-describedby={chooseError ? 'prep-mail-choose-err' : undefined}>
          <legend className="mb-1 text-sm font-bold text-ink">Kitchen assistants</legend>
          {team.isPending && <p className="text-sm text-ink-soft">Reading your team…</p>}
          {team.isError && <p className="text-sm text-ink-soft">The team could not be read: every kitchen assistant gets it.</p>}
          {team.data && assistants.length === 0 && (
            <p className="text-sm text-ink-soft">
              None yet: <Link to={paths.team} className="underline">invite one</Link>, or give an address.
            </p>
          )}
          {assistants.map((a) => (
            <label key={a.userId} className="flex min-h-11 items-center gap-2">
              <input
                type="checkbox"
                className="h-5 w-5 accent-herb"
                checked={!leftOut.includes(a.userId)}
                onChange={(e) => changed(setLeftOut)(e.target.checked ? leftOut.filter((u) => u !== a.userId) : [...leftOut, a.userId])}
              />
              <span>
                {a.name} <span className="text-sm text-ink-soft">{a.email}</span>
              </span>
            </label>
          ))}
          {chooseError && (
            <p id="prep-mail-choose-err" role="alert" className="text-sm font-bold text-signal">
              <span aria-hidden>⚠</span> {chooseError}
            </p>
          )}
        </fieldset>
        <TextField
          label="Other addresses (optional)"
          type="text"
          inputMode="email"
          autoComplete="off"
          placeholder="kitchen@example.com"
          value={others}
          error={addressMessage}
          hint={`Up to ${PREP_ALSO_TO_MAX}, separated by commas: a kitchen's shared inbox, say. Their papers are in your measures, with no link into Trayline.`}
          onChange={(e) => changed(setOthers)(e.target.value)}
        />
      </div>
      <div>
        <Button type="submit" variant="secondary" busy={send.isPending}>
          E-mail the shopping list and bake run
        </Button>
      </div>
      {result && (
        <Notice tone="info" title={result.repeated ? 'Already on its way' : `Queued for ${counted(result.recipients.length, 'person', 'people')}`}>
          {result.recipients.map((r) => (r.account ? `${r.name} (${r.email})` : r.email)).join(', ')}. Follow it in the{' '}
          <Link to={paths.outbox} className="underline">
            outbox
          </Link>
          .
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
