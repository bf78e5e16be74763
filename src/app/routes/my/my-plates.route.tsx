import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { allergenLabel, clientAllergenNotes } from '@shared/domain/allergens';
import { FRIDGE_MAX_F, REHEAT_MIN_F, thawTasks, THAW_REMINDER_TIME, type ThawTask } from '@shared/domain/eat-by';
import { amountAndName } from '@shared/domain/units';
import { useMe } from '@/features/auth/hooks/use-me';
import type { MyDayDto, MyPlateDto } from '@shared/schemas/weeks.schema';
import { myWeekQuery } from '@/features/weeks/api/weeks.queries';
import { useKeptAnswer } from '@/lib/use-kept-answer';
import { localToday, momentLabel, timeLabel } from '@/lib/dates';
import { compareIsoDates } from '@shared/domain/iso-date';
import { Card, EmptyState, ErrorState, KeptCopyNotice, Notice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { Cautions } from '@/components/domain/cautions';
import { linkButton } from '@/components/ui/button';
import { useOnline } from '@/lib/online';
import { myPlanPdfUrl, myThawRemindersUrl } from '@/features/mail/api/week-mail.queries';
import { DemoNotice } from '@/features/auth/components/demo-notice';
import { counted } from '@/lib/words';
import { dayLabel } from '@/lib/dates';
import { reheatGroups, reheatGroupTitle, type ReheatSource } from '@shared/domain/reheat';
import { bothScales } from '@shared/domain/temperature';
import { useTempScale } from '@/lib/temp-scale';

function Macros({ m }: { m: MyPlateDto['macros'] }) {
  return (
    <dl className="grid grid-cols-4 gap-1 text-center">
      {[
        ['kcal', Math.round(m.kcal)],
        ['net carbs', `${m.netCarbsG} g`],
        ['protein', `${m.proteinG} g`],
        ['fat', `${m.fatG} g`],
      ].map(([k, v]) => (
        <div key={k} className="rounded-lg bg-paper p-2">
          <dd className="num text-lg font-bold">{v}</dd>
          <dt className="text-xs text-ink-faint">{k}</dt>
        </div>
      ))}
    </dl>
  );
}

/** The plate's allergens on the client's own list: said, with what to do. */
function YourAllergens({ plate }: { plate: MyPlateDto }) {
  return clientAllergenNotes(plate.onYourList ?? [], plate.allowedAllergens).map((n) => (
    <Notice key={n.tone} tone={n.tone === 'stop' ? 'block' : 'warn'} title={n.title}>
      {n.body}
    </Notice>
  ));
}

function PlateCard({ plate, today }: { plate: MyPlateDto; today: string }) {
  const { unitSystem } = useMe();
  const scale = useTempScale();
  return (
    <Card className="flex flex-col gap-3">
      <p className="text-sm uppercase tracking-wide text-ink-faint">{plate.slot}</p>
      <h2 className="text-2xl">{plate.name}</h2>
      {plate.description && <p className="text-ink-soft">{plate.description}</p>}
      <Macros m={plate.macros} />
      {plate.allergens.length > 0 && <p className="text-sm">Contains: {plate.allergens.map(allergenLabel).join(', ')}</p>}
      <YourAllergens plate={plate} />
      {plate.storage === 'frozen' ? (
        <Notice tone="cold" title={`Frozen portion: move it to the fridge on the evening of ${plate.thawOn ? dayLabel(plate.thawOn, true) : 'the day before'}`}>
          Thaw in the refrigerator, never on the counter.
        </Notice>
      ) : (
        plate.eatBy &&
        (compareIsoDates(plate.eatBy, today) < 0 ? (
          <Notice tone="block" title={`Past its eat-by date (${dayLabel(plate.eatBy, true)})`}>
            If it is still in your fridge, throw it away: do not eat it.
          </Notice>
        ) : (
          <Notice tone="cold" title={`Eat by ${dayLabel(plate.eatBy, true)}`}>Keep it in the fridge at {bothScales(FRIDGE_MAX_F, scale)} or below.</Notice>
        ))
      )}
      <section>
        <h3 className="font-bold">What is on the plate</h3>
        <ul className="list-disc pl-5">
          {plate.trays.map((t) => (
            <li key={t.trayId}>
              {counted(t.portions, 'portion')} of {t.name}
            </li>
          ))}
          {plate.addOns.map((a, i) => (
            <li key={i}>
              {amountAndName(a.amountText, a.unit, a.name, unitSystem)} {a.note && <span className="text-ink-faint">({a.note})</span>}
            </li>
          ))}
        </ul>
      </section>
      {plate.assemblySteps.length > 0 && (
        <section>
          <h3 className="font-bold">Put it together</h3>
          <ol className="list-decimal pl-5">
            {plate.assemblySteps.map((s, i) => (
              <li key={i}>{s}</li>
            ))}
          </ol>
        </section>
      )}
      <Reheat plate={plate} />
    </Card>
  );
}

/** How to reheat the plate: the plate's own steps, or each tray's under its name (shared/domain/reheat.ts). */
function Reheat({ plate }: { plate: ReheatSource }) {
  const groups = reheatGroups(plate);
  const scale = useTempScale();
  return (
    <section className="flex flex-col gap-1">
      <h3 className="font-bold">Reheat</h3>
      {groups.map((g, n) => {
        const title = reheatGroupTitle(g, groups.length);
        return (
          <div key={n}>
            {title && <h4 className="font-bold text-ink-soft">{title}</h4>}
            <ol className="list-decimal pl-5">
              {g.steps.map((s, i) => (
                <li key={i}>{s}</li>
              ))}
            </ol>
          </div>
        );
      })}
      <p>
        Heat until every part reaches {bothScales(REHEAT_MIN_F, scale)}.
      </p>
    </section>
  );
}

/** The evening's job: frozen plates of the next day to move to the fridge (the reminder the plan promises). */
function ThawTonight({ tasks, date, isToday }: { tasks: ThawTask[]; date: string; isToday: boolean }) {
  if (tasks.length === 0) return null;
  return (
    <Notice tone="cold" title={`${isToday ? 'Tonight' : `On the evening of ${dayLabel(date, true)}`}: move ${tasks.length === 1 ? 'a frozen plate' : 'frozen plates'} to the fridge`}>
      <ul className="list-disc pl-5">
        {tasks.map((t) => (
          <li key={`${t.eatOn}-${t.slot}`}>
            {t.name} ({t.slot}, {dayLabel(t.eatOn, true)})
          </li>
        ))}
      </ul>
      <p>Around {timeLabel(THAW_REMINDER_TIME)}: thaw in the refrigerator, never on the counter.</p>
    </Notice>
  );
}

export function Component() {
  const today = localToday();
  const me = useMe();
  const online = useOnline();
  const query = myWeekQuery(today);
  const q = useQuery(query);
  const [picked, setPicked] = useState<string | null>(null);
  // Each answer is kept on the device; without one for today (offline, or the server out of reach), the kept plan.
  const { fromDevice, seeding } = useKeptAnswer(q, query.queryKey, 'my-week', me);
  if (q.data === undefined) {
    if (q.fetchStatus === 'paused' && !seeding) {
      return (
        <div className="flex flex-col gap-6">
          <PageHeader title="My plates" />
          <EmptyState title="You are offline">
            Your plan has not been saved on this device yet. It shows here once you are back online, and from then on
            without a network too.
          </EmptyState>
        </div>
      );
    }
    return q.isError && !seeding ? <ErrorState error={q.error} retry={() => q.refetch()} /> : <PageSkeleton />;
  }
  const week = q.data;
  const savedCopy = fromDevice !== null && (
    <KeptCopyNotice what="plan" savedAt={fromDevice} online={online} retry={() => void q.refetch()} retrying={q.isFetching}>
      If your coach has changed your plan since, the change shows here once you are back online.
    </KeptCopyNotice>
  );
  if (!week || (week.days.length === 0 && !week.next)) {
    return (
      <div className="flex flex-col gap-6">
        <PageHeader title="My plates" />
        {savedCopy}
        <EmptyState title="No plan yet">Your coach has not published a week for you yet.</EmptyState>
      </div>
    );
  }
  // Files come from the server: offered while it can be reached.
  const canDownload = online && fromDevice === null;
  // The next published week's days too: the client can look ahead, and a frozen plate on its first day thaws on
  // this week's last evening.
  const allDays = [...week.days, ...(week.next?.days ?? [])];
  // The latest published week has ended: the coach has not published one for today yet.
  const ended = compareIsoDates(week.endDate, today) < 0;
  // Today's plates, else the next day with plates; never a day gone by unless the client picks it.
  const day = allDays.find((d) => d.date === (picked ?? today)) ?? (picked ? undefined : allDays.find((d) => compareIsoDates(d.date, today) > 0));
  const thaws = thawTasks(allDays);
  const shownDate = day?.date ?? picked ?? today;
  const dayButton = (d: MyDayDto) => (
    <li key={d.date}>
      <button
        type="button"
        onClick={() => {
          setPicked(d.date);
          // The day's plates are drawn above this list: bring them into view.
          window.scrollTo({ top: 0, behavior: 'smooth' });
        }}
        aria-current={d.date === day?.date ? 'date' : undefined}
        className={`flex min-h-11 w-full items-center justify-between gap-2 px-2 py-2 text-left ${d.date === day?.date ? 'bg-paper-deep font-bold' : ''}`}
      >
        <span>
          {dayLabel(d.date)}
          {d.date === today && <span className="ml-1 text-xs text-herb-700">today</span>}
          {compareIsoDates(d.date, today) >= 0 && thaws.some((t) => t.thawOn === d.date) && <span className="ml-1 text-xs text-frost-700">❄ thaw tonight</span>}
          {d.plates.some((p) => p.onYourList?.length) && <span className="ml-1 text-xs text-caution-700">⚠ allergen on your list</span>}
          <span className="block text-sm font-normal text-ink-soft">{d.plates.map((p) => p.name).join(' · ')}</span>
        </span>
        <span className="num text-sm">{Math.round(d.totals.kcal)} kcal · {d.totals.netCarbsG} g net</span>
      </button>
    </li>
  );
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-5">
      <PageHeader
        title={day?.date === today ? "Today's plate" : 'My plates'}
        lead={day ? `${!picked && day.date !== today ? 'Next plate: ' : ''}${dayLabel(day.date, true)}` : dayLabel(shownDate, true)}
      >
        {canDownload && week.days.length > 0 && (
          <a href={`${myPlanPdfUrl}?today=${today}`} className={linkButton} download>
            {ended ? 'Download last week (PDF)' : 'Download my week (PDF)'}
          </a>
        )}
        {canDownload && !ended && thawTasks(week.days).length > 0 && (
          <a href={`${myThawRemindersUrl}?today=${today}`} className={linkButton} download>
            Thaw reminders for my calendar
          </a>
        )}
      </PageHeader>
      {savedCopy}
      <DemoNotice>A demo account: this plan and its people are invented for trying Trayline.</DemoNotice>
      {compareIsoDates(shownDate, today) >= 0 && <ThawTonight tasks={thaws.filter((t) => t.thawOn === shownDate)} date={shownDate} isToday={shownDate === today} />}
      {day ? (
        day.plates.map((p) => <PlateCard key={p.slot} plate={p} today={today} />)
      ) : picked ? (
        <EmptyState title="Nothing planned that day" />
      ) : ended ? (
        <EmptyState title="Nothing planned today">
          Your last plan ended on {dayLabel(week.endDate, true)}. Your coach has not published your next week yet: its plates show here once they do.
        </EmptyState>
      ) : (
        <EmptyState title="No more plates this week">Your coach’s next week shows here once it is published.</EmptyState>
      )}
      {week.days.length > 0 && (
      <Card>
        <h2 className="mb-2 text-xl">{ended ? 'Your last week' : 'The week at a glance'}</h2>
        <ul className="flex flex-col divide-y divide-line">{week.days.map(dayButton)}</ul>
        <p className="mt-2 text-xs text-ink-faint">
          Version {week.publishedVersion}, published {momentLabel(week.publishedAt)}.
        </p>
      </Card>
      )}
      {week.next && (
        <Card>
          <h2 className="mb-1 text-xl">Next week</h2>
          <p className="mb-2 text-sm text-ink-soft">
            {week.next.name}, from {dayLabel(week.next.startDate, true)}: published, so it is what your coach plans for you.
          </p>
          <ul className="flex flex-col divide-y divide-line">{week.next.days.map(dayButton)}</ul>
          {/* Its own files: the plan and thaw reminders of the week that starts then. */}
          {canDownload && (
            <p className="mt-2 flex flex-wrap gap-x-2">
              <a href={`${myPlanPdfUrl}?today=${week.next.startDate}`} className="inline-flex min-h-11 items-center font-bold underline" download>
                Download next week (PDF)
              </a>
              {thawTasks(week.next.days).length > 0 && (
                <a href={`${myThawRemindersUrl}?today=${week.next.startDate}`} className="inline-flex min-h-11 items-center font-bold underline" download>
                  Its thaw reminders for my calendar
                </a>
              )}
            </p>
          )}
        </Card>
      )}
      <Cautions compact />
    </div>
  );
}
