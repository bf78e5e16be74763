import ical, { ICalAlarmType } from 'ical-generator';
import { FRIDGE_MAX_F, THAW_REMINDER_TIME, type ThawTask } from '@shared/domain/eat-by.js';
import { bothScales, type TempScale } from '@shared/domain/temperature.js';
import { addLocalMinutes } from '@shared/domain/bake-run-time.js';
import { floating } from '../../lib/ics.js';
import { longDate, type DateOrder } from '@shared/domain/iso-date.js';

/** Minutes a thaw reminder event lasts in the calendar (moving a box takes a minute; 15 shows as a block). */
const THAW_EVENT_MINUTES = 15;

/**
 * A client's thaw reminders as an iCalendar file (RFC 5545) made with ical-generator: one event per frozen plate
 * on the evening before its day, at THAW_REMINDER_TIME on the phone's own clock (a floating time), with an alarm.
 * Event ids name the week, the day and the slot (not the published version): importing a newer version's file updates
 * the same events instead of adding twins.
 */
export function thawRemindersIcs(
  tasks: readonly ThawTask[],
  meta: { calendarName: string; uidPrefix: string; dateOrder: DateOrder; tempScale?: TempScale },
): string {
  const cal = ical({ name: meta.calendarName, prodId: { company: 'Trayline', product: 'thaw-reminders', language: 'EN' } });
  for (const t of tasks) {
    const start = `${t.thawOn}T${THAW_REMINDER_TIME}`;
    const event = cal.createEvent({
      id: `${meta.uidPrefix}-${t.eatOn}-${t.slot}@trayline`,
      start: floating(start),
      end: floating(addLocalMinutes(start, THAW_EVENT_MINUTES)),
      floating: true,
      summary: `Move tomorrow's ${t.name} to the fridge`,
      description:
        `For ${t.slot} on ${longDate(t.eatOn, meta.dateOrder)}. Thaw it in the refrigerator at ${bothScales(FRIDGE_MAX_F, meta.tempScale ?? 'F')} or ` +
        `below, never on the counter. Eat it by ${longDate(t.eatByAfterThaw, meta.dateOrder)} at the latest.`,
    });
    event.createAlarm({ type: ICalAlarmType.display, trigger: 0, description: `Move tomorrow's ${t.name} to the fridge` });
  }
  return cal.toString();
}
