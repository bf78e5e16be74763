import { useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { addDays, daysBetween, isIsoDate } from '@shared/domain/iso-date';
import { firstFreeMonday } from '@shared/domain/week-days';
import { WEEK_NAME_MAX, type WeekSummaryDto } from '@shared/schemas/weeks.schema';
import { weeksQuery } from '@/features/weeks/api/weeks.queries';
import { localToday } from '@/lib/dates';
import { useCopyWeek, useCreateWeek, type WeekPageState } from '@/features/weeks/api/use-week-mutations';
import { useMe } from '@/features/auth/hooks/use-me';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Card, EmptyState, Notice, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { isApiError, errorMessage, markShown } from '@/lib/problem';
import { paths } from '@/config/paths';
import { dayLabel } from '@/lib/dates';
import { useFollowedText } from '@/lib/use-followed-text';
import { splitFieldErrors } from '@/lib/form-errors';

/** The fields of the new-week form that show their own error. */
const SHOWN_FIELDS = new Set(['name', 'startDate', 'prepDate', 'secondPrepDate']);

/** A date of the source week moved to the new board: the same day of the week. */
function shifted(source: WeekSummaryDto, date: string | null, startDate: string): string {
  if (!date || !isIsoDate(startDate)) return '';
  return addDays(date, daysBetween(source.startDate, startDate));
}

export function Component() {
  const me = useMe();
  const list = useQuery(weeksQuery());
  const create = useCreateWeek();
  const copy = useCopyWeek();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const [form, setForm] = useState({ name: '', startDate: '', prepDate: '', secondPrepDate: '' });
  // "Copy to a new week" on a board opens this page with ?from=<id>: the form starts from that week (and follows the
  // address, the menu's "Prep weeks" link from here included, unless another week was picked here).
  const [fromId, setFromId] = useFollowedText(params.get('from') ?? '');
  const source = list.data?.find((w) => String(w.id) === fromId) ?? null;
  // Until the coach picks them: the board starts on the first Monday no week plans yet; a copy's prep days fall on
  // the same days of the week as its source's, a new board's the day before it starts.
  const [startPicked, setStartPicked] = useState(false);
  const [prepPicked, setPrepPicked] = useState(false);
  const [secondPicked, setSecondPicked] = useState(false);
  // "?start=": a link that knows the first day ("plan this week" once the last week is over: from today).
  const today = localToday();
  const startParam = params.get('start');
  const startDate = startPicked ? form.startDate : startParam && isIsoDate(startParam) ? startParam : firstFreeMonday(today, list.data ?? []);
  // A proposed prep day is never a day gone by (a board from today is prepped today at the earliest).
  const proposedPrep = source ? shifted(source, source.prepDate, startDate) : isIsoDate(startDate) ? addDays(startDate, -1) : '';
  const prepDate = prepPicked ? form.prepDate : isIsoDate(proposedPrep) && proposedPrep < today ? today : proposedPrep;
  const proposedSecond = source ? shifted(source, source.secondPrepDate, startDate) : '';
  const secondPrepDate = secondPicked ? form.secondPrepDate : proposedSecond && proposedSecond <= prepDate ? '' : proposedSecond;
  const saving = create.isPending || copy.isPending;
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Prep weeks" lead="Each week: one or two prep days, the trays to bake and the week board." />
      {me.role === 'coach' && (
        <Card>
          <h2 className="mb-3 text-xl">New week</h2>
          <form
            noValidate
            className="grid items-start gap-3 sm:grid-cols-5"
            onSubmit={(e) => {
              e.preventDefault();
              setErrors({});
              setFormError(null);
              const input = { name: form.name, startDate, prepDate, secondPrepDate: secondPrepDate || null };
              const onError = (err: unknown) => {
                markShown(err);
                if (!isApiError(err, 400)) return setFormError(errorMessage(err));
                // What no field below shows (the source week, say) is said under the form, never dropped.
                const { onFields, unseen } = splitFieldErrors(err, (name) => SHOWN_FIELDS.has(name));
                setErrors(onFields);
                if (unseen.length > 0 || Object.keys(onFields).length === 0) setFormError(unseen.join(' ') || errorMessage(err));
              };
              if (source)
                copy.mutate(
                  { ...input, fromId: source.id },
                  {
                    // The new board says what came over and what stayed behind.
                    onSuccess: ({ board, copied }) => navigate(paths.week(board.week.id), { state: { copied: { ...copied, from: source.name } } satisfies WeekPageState }),
                    onError,
                  },
                );
              else create.mutate(input, { onSuccess: (b) => navigate(paths.week(b.week.id)), onError });
            }}
          >
            {(list.data?.length ?? 0) > 0 && (
              <SelectField
                label="Start from"
                className="sm:col-span-5 sm:max-w-xl"
                value={source ? fromId : ''}
                onChange={(e) => setFromId(e.target.value)}
                hint={source ? 'Its plates move to the same days of the new board, with its tray counts. Archived clients and archived plates stay behind.' : undefined}
              >
                <option value="">An empty board</option>
                {list.data?.map((w) => (
                  <option key={w.id} value={w.id}>
                    A copy of {w.name} ({dayLabel(w.startDate)} – {dayLabel(w.endDate)})
                  </option>
                ))}
              </SelectField>
            )}
            <TextField label="Name (optional)" value={form.name} maxLength={WEEK_NAME_MAX} error={errors.name?.[0]} onChange={(e) => setForm({ ...form, name: e.target.value })} />
            <TextField label="First day of the board" type="date" value={startDate} error={errors.startDate?.[0]} onChange={(e) => {
                setStartPicked(true);
                setForm({ ...form, startDate: e.target.value });
              }}
            />
            <TextField label="Prep day" type="date" value={prepDate} error={errors.prepDate?.[0]} onChange={(e) => {
                setPrepPicked(true);
                setForm({ ...form, prepDate: e.target.value });
              }}
            />
            <TextField label="Second prep day" type="date" value={secondPrepDate} error={errors.secondPrepDate?.[0]} onChange={(e) => {
                setSecondPicked(true);
                setForm({ ...form, secondPrepDate: e.target.value });
              }}
            />
            {/* Level with the inputs (under a label: 1.25 rem of text and the 0.25 rem gap), whatever a field says below. */}
            <Button type="submit" busy={saving} className="sm:mt-6">
              {source ? 'Copy' : 'Create'}
            </Button>
          </form>
          {formError && <Notice tone="block" title={formError} />}
        </Card>
      )}
      <Card>
        <QueryView
          query={list}
          loading={<Skeleton className="h-24 w-full" />}
          isEmpty={(data) => data.length === 0}
          empty={<EmptyState title="No prep weeks yet">Create a week above to start its board.</EmptyState>}
        >
          {(data) => (
            <ul className="flex flex-col divide-y divide-line">
              {data.map((w) => (
                <li key={w.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                  <div>
                    {me.role === 'coach' ? (
                      <Link to={paths.week(w.id)} className="text-lg font-bold underline">
                        {w.name}
                      </Link>
                    ) : (
                      <span className="text-lg font-bold">{w.name}</span>
                    )}
                    <p className="text-sm text-ink-soft">
                      {dayLabel(w.startDate)} – {dayLabel(w.endDate)} · prep {dayLabel(w.prepDate)}
                      {w.secondPrepDate ? ` and ${dayLabel(w.secondPrepDate)}` : ''} · <span className="num">{w.cellCount}</span> plates placed
                    </p>
                    {/* Any week's kitchen pages, not only the one the kitchen is on now (last Sunday's labels on Monday). */}
                    <ul className="flex flex-wrap gap-x-3 text-sm" aria-label={`${w.name}: kitchen pages`}>
                      {[
                        { to: paths.shopping(w.id), label: 'Shopping list' },
                        { to: paths.bakeRun(w.id), label: 'Bake run' },
                        { to: paths.labels(w.id), label: 'Labels' },
                      ].map((l) => (
                        <li key={l.label}>
                          <Link to={l.to} className="inline-flex min-h-11 items-center underline">
                            {l.label}
                          </Link>
                        </li>
                      ))}
                    </ul>
                  </div>
                  <span className="text-sm">
                    {w.publishedVersion ? `Published v${w.publishedVersion}${w.changedSincePublished ? ' (changed since)' : ''}` : 'Draft'}
                  </span>
                </li>
              ))}
            </ul>
          )}
        </QueryView>
      </Card>
    </div>
  );
}
