import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { bakeRunFiles, ovensQuery, weekBakeRunQuery } from '@/features/bake-runs/api/bake-runs.queries';
import { useMoveBakeRunStart, useSaveBakeRunSettings, useSetBakeRunKitchen } from '@/features/bake-runs/api/use-bake-run-mutations';
import { BakeRunSettingsForm } from '@/features/bake-runs/components/bake-run-settings-form';
import { BakeRunView, UnitToggle } from '@/features/bake-runs/components/bake-run-view';
import { CoolingRecord } from '@/features/bake-runs/components/cooling-record';
import { coolingQuery } from '@/features/bake-runs/api/cooling';
import type { TempUnit } from '@/features/bake-runs/components/temperature';
import { useMe } from '@/features/auth/hooks/use-me';
import { Button } from '@/components/ui/button';
import { DayOptions, SelectField } from '@/components/ui/field';
import { EmptyState, ErrorState, Notice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { replannedSummary } from '@shared/domain/bake-run-words';
import { errorMessage, isApiError } from '@/lib/problem';
import { currentClockStyle, dayLabel, timeLabel } from '@/lib/dates';
import { useScrollToHash } from '@/lib/use-scroll-to-hash';

const linkClass = 'inline-flex min-h-11 items-center rounded-lg border border-line-strong bg-paper-card px-4 font-bold text-ink hover:bg-paper-deep';

/**
 * A prep week's bake run: the coach sets start, cooks, ovens and hands-on minutes; everyone reads the plan; on prep
 * day whoever runs the bake moves the start to when the kitchen really started.
 */
export function Component() {
  const me = useMe();
  const weekId = Number(useParams().weekId);
  const [params, setParams] = useSearchParams();
  const prepDate = params.get('prepDate') ?? undefined;
  const [unit, setUnit] = useState<TempUnit>(me.tempUnit);
  const q = useQuery(weekBakeRunQuery(weekId, prepDate));
  // The cooling record of the day shown (the section below reads the same query): the timers follow it.
  const cooling = useQuery({ ...coolingQuery(weekId, q.data?.prepDate ?? ''), enabled: Boolean(q.data?.run) });
  const ovens = useQuery(ovensQuery());
  const save = useSaveBakeRunSettings(weekId);
  const moveStart = useMoveBakeRunStart(weekId);
  const kitchen = useSetBakeRunKitchen(weekId);
  // "Plan the whole day from its start again": the same change, its own pending state and failure.
  const restart = useSetBakeRunKitchen(weekId);
  // A link to a section (the cooling watch's e-mail: "#cooling-record-title") lands on it once the record is read.
  useScrollToHash(cooling.isSuccess);

  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const dto = q.data;
  const files = bakeRunFiles(weekId, dto.prepDate);
  const replanned = dto.run && dto.settings.done ? replannedSummary(dto.settings.done.from, dto.settings.done.out.length, dto.run.trays.length, currentClockStyle()) : '';
  return (
    <div className="flex flex-col gap-5">
      <PageHeader title="Bake run" lead={`${dto.weekName}, prep day ${dayLabel(dto.prepDate, true)}`}>
        <UnitToggle unit={unit} onChange={setUnit} />
        {dto.run && (
          <>
            <Button variant="secondary" onClick={() => window.print()}>
              Print run sheet
            </Button>
            <a className={linkClass} href={files.pdf}>
              PDF
            </a>
            <a className={linkClass} href={files.ics}>
              Add to calendar (iCal)
            </a>
          </>
        )}
      </PageHeader>
      {dto.prepDates.length > 1 && (
        <SelectField
          label="Prep day"
          className="no-print max-w-xs"
          value={dto.prepDate}
          onChange={(e) => setParams({ prepDate: e.target.value }, { replace: true })}
        >
          <DayOptions days={dto.prepDates} />
        </SelectField>
      )}
      {me.role === 'coach' && ovens.data && (
        <BakeRunSettingsForm
          key={dto.prepDate}
          dto={dto}
          allOvens={ovens.data}
          saving={save.isPending}
          error={save.error}
          onSave={(body) => save.mutate(body)}
          onReload={() => {
            save.reset();
            q.refetch();
          }}
        />
      )}
      {dto.problems.length > 0 && (
        <EmptyState title="Nothing to plan yet">
          <ul className="list-disc pl-4">
            {dto.problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
          {me.role === 'coach' && (
            <p className="mt-2">
              <Link className="font-bold underline" to={paths.bakeRules}>
                Bake rules &amp; ovens
              </Link>{' '}
              ·{' '}
              <Link className="font-bold underline" to={paths.week(weekId)}>
                Week board
              </Link>
            </p>
          )}
        </EmptyState>
      )}
      {dto.run && dto.settings.done && (
        <Notice tone="info" title={`Planned again from ${timeLabel(dto.settings.done.from)}`}>
          {replanned.charAt(0).toUpperCase()}
          {replanned.slice(1)}.
          <div className="mt-2">
            <Button
              size="sm"
              variant="secondary"
              busy={restart.isPending}
              onClick={() =>
                restart.mutate(
                  {
                    prepDate: dto.prepDate,
                    cooks: dto.settings.cooks,
                    ovenIds: dto.ovens.map((o) => o.id),
                    out: [],
                    ...(dto.settings.version === null ? {} : { version: dto.settings.version }),
                  },
                  { onError: (e) => isApiError(e, 409) && q.refetch() },
                )
              }
            >
              Plan the whole day from its start again
            </Button>
          </div>
          {restart.error && (
            <p role="alert" className="mt-2 font-bold text-signal-700">
              ⚠{' '}
              {isApiError(restart.error, 409)
                ? 'Someone changed this run meanwhile: this page now shows their version. Try again if it is still needed.'
                : errorMessage(restart.error)}
            </p>
          )}
        </Notice>
      )}
      {dto.run && (
        <BakeRunView
          run={dto.run}
          unit={unit}
          cooling={cooling.data?.records}
          coolingRecord={<CoolingRecord weekId={weekId} run={dto.run} unit={unit} role={me.role === 'coach' ? 'coach' : 'assistant'} />}
          move={{
            saving: moveStart.isPending,
            error: moveStart.error,
            onMove: (start) =>
              moveStart.mutate({ prepDate: dto.prepDate, start, ...(dto.settings.version === null ? {} : { version: dto.settings.version }) }),
            onReload: () => {
              moveStart.reset();
              q.refetch();
            },
          }}
          kitchen={
            ovens.data
              ? {
                  allOvens: ovens.data,
                  ovenIds: dto.ovens.map((o) => o.id),
                  cooks: dto.settings.cooks,
                  done: dto.settings.done,
                  version: dto.settings.version,
                  saving: kitchen.isPending,
                  error: kitchen.error,
                  onChange: (cooks, ovenIds, version, progress) =>
                    kitchen.mutate({ prepDate: dto.prepDate, cooks, ovenIds, ...progress, ...(version === null ? {} : { version }) }),
                  onReload: () => {
                    kitchen.reset();
                    q.refetch();
                  },
                }
              : undefined
          }
        />
      )}
      {dto.run === null && dto.problems.length === 0 && <Notice tone="info">No plan.</Notice>}
    </div>
  );
}
