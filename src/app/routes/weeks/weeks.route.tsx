import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { addDays, isIsoDate } from '@shared/domain/iso-date';
import { weeksQuery, localToday } from '@/features/weeks/api/weeks.queries';
import { useCreateWeek } from '@/features/weeks/api/use-week-mutations';
import { useMe } from '@/features/auth/hooks/use-me';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card, EmptyState, Notice, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { isApiError, errorMessage } from '@/lib/problem';
import { paths } from '@/config/paths';
import { dayLabel } from '@/lib/dates';

function nextMonday(today: string): string {
  const d = new Date(`${today}T12:00:00Z`).getUTCDay();
  return addDays(today, ((8 - d) % 7) || 7);
}

export function Component() {
  const me = useMe();
  const list = useQuery(weeksQuery());
  const create = useCreateWeek();
  const navigate = useNavigate();
  const start = nextMonday(localToday());
  const [form, setForm] = useState({ name: '', startDate: start, prepDate: addDays(start, -1), secondPrepDate: '' });
  // The prep day follows the first day of the board (the day before) until the coach picks one.
  const [prepPicked, setPrepPicked] = useState(false);
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
            className="grid items-end gap-3 sm:grid-cols-5"
            onSubmit={(e) => {
              e.preventDefault();
              setErrors({});
              setFormError(null);
              create.mutate(
                { ...form, secondPrepDate: form.secondPrepDate || null },
                {
                  onSuccess: (b) => navigate(paths.week(b.week.id)),
                  onError: (err) => {
                    if (isApiError(err, 400)) setErrors(Object.fromEntries(Object.entries(err.fieldErrors).map(([k, v]) => [k.replace(/^body\./, ''), v])));
                    else setFormError(errorMessage(err));
                  },
                },
              );
            }}
          >
            <TextField label="Name (optional)" value={form.name} onChange={(e) => setForm({ ...form, name: e.target.value })} />
            <TextField label="First day of the board" type="date" value={form.startDate} error={errors.startDate?.[0]} onChange={(e) => {
                const startDate = e.target.value;
                const follows = !prepPicked && isIsoDate(startDate);
                setForm({ ...form, startDate, prepDate: follows ? addDays(startDate, -1) : form.prepDate });
              }}
            />
            <TextField label="Prep day" type="date" value={form.prepDate} error={errors.prepDate?.[0]} onChange={(e) => {
                setPrepPicked(true);
                setForm({ ...form, prepDate: e.target.value });
              }}
            />
            <TextField label="Second prep day" type="date" value={form.secondPrepDate} error={errors.secondPrepDate?.[0]} onChange={(e) => setForm({ ...form, secondPrepDate: e.target.value })} />
            <Button type="submit" busy={create.isPending}>
              Create
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
