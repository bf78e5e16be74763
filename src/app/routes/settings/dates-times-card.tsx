import { useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from 'sonner';
import { DATE_ORDERS, shortDate, type DateOrder } from '@shared/domain/iso-date';
import { CLOCK_STYLES, clockText, type ClockStyle } from '@shared/domain/clock';
import { deviceTimeZone, timeZoneChoices, wallClockIn, zoneName } from '@shared/domain/time-zone';
import type { WorkspaceSettingsUpdateInput } from '@shared/schemas/ingredients.schema';
import { SelectField } from '@/components/ui/field';
import { Button } from '@/components/ui/button';
import { dayLabel, timeLabel } from '@/lib/dates';
import { Card, Notice, QueryView, Skeleton } from '@/components/ui/states';
import { isApiError, markShown } from '@/lib/problem';
import { workspaceSettingsQuery } from '@/features/ingredients/api/ingredients.queries';
import { useUpdateWorkspaceSettings } from '@/features/ingredients/api/use-ingredient-mutations';

/** A sample day and time for the choices (a Monday afternoon; any shows the style). */
const SAMPLE = '2026-12-07';
const SAMPLE_TIME = '13:45';

const DATE_ORDER_WORDS: Record<DateOrder, string> = {
  'month-day': `${shortDate(SAMPLE, 'month-day')} (month first)`,
  'day-month': `${shortDate(SAMPLE, 'day-month')} (day first)`,
};

const CLOCK_WORDS: Record<ClockStyle, string> = {
  '24h': `${clockText(SAMPLE_TIME, '24h')} (24-hour clock)`,
  '12h': `${clockText(SAMPLE_TIME, '12h')} (12-hour clock)`,
};

/**
 * The zones grouped by their region ("America", "Europe", …; "UTC" and the like under "Other"), for a select. The
 * last answer is kept: the card renders again on every save and tick, the list of some 420 zones does not change.
 */
function zoneGroups(current: string | null): Array<[string, string[]]> {
  if (!lastGroups || lastGroups.current !== current) lastGroups = { current, groups: groupZones(current) };
  return lastGroups.groups;
}
let lastGroups: { current: string | null; groups: Array<[string, string[]]> } | null = null;

function groupZones(current: string | null): Array<[string, string[]]> {
  const zones = timeZoneChoices();
  if (current && !zones.includes(current)) zones.push(current);
  const groups = new Map<string, string[]>();
  for (const z of zones) {
    const region = z.includes('/') ? z.slice(0, z.indexOf('/')) : 'Other';
    groups.set(region, [...(groups.get(region) ?? []), z]);
  }
  return [...groups.entries()].sort(([a], [b]) => (a === 'Other' ? 1 : b === 'Other' ? -1 : a.localeCompare(b)));
}

const placeOf = (zone: string) => zoneName(zone.includes('/') ? zone.slice(zone.indexOf('/') + 1) : zone).replace(/\//g, ' / ');

/** "Thu, Dec 3, 15:12" in the kitchen's zone now, as the workspace writes dates and times. */
function kitchenTimeIn(zone: string): string {
  const wall = wallClockIn(new Date(), zone);
  return `${dayLabel(wall.slice(0, 10))}, ${timeLabel(wall)}`;
}

/**
 * How the workspace writes dates and times of day (coach only): every page, printed label, PDF, calendar file and
 * e-mail follows them, for everyone in the workspace. Saved on change, like the units.
 */
export function DatesTimesCard() {
  const qc = useQueryClient();
  const settings = useQuery(workspaceSettingsQuery());
  const save = useUpdateWorkspaceSettings();
  const [stale, setStale] = useState(false);
  const change = (patch: Omit<WorkspaceSettingsUpdateInput, 'version'>, version: number, said: string) => {
    setStale(false);
    save.mutate(
      { ...patch, version },
      {
        // Server-written words (week names, messages) change too: read everything again.
        onSuccess: () => {
          toast.success(said);
          return qc.invalidateQueries();
        },
        onError: (err) => {
          if (isApiError(err, 409)) {
            markShown(err);
            setStale(true);
            void settings.refetch();
          }
        },
      },
    );
  };
  return (
    <Card>
      <h2 className="mb-3 text-xl">Dates and times</h2>
      <QueryView query={settings} loading={<Skeleton className="h-16 w-full" label="Loading the date and time settings" />}>
        {(data) => (
          <div className="flex flex-col gap-3">
            <SelectField
              label="Write dates as"
              value={data.dateOrder}
              disabled={save.isPending}
              hint="For everyone in this workspace: pages, labels, shopping lists, bake runs, plan PDFs and e-mails. Plans already e-mailed keep the words they left with."
              onChange={(e) => {
                const dateOrder = e.target.value as DateOrder;
                change({ dateOrder }, data.version, `Dates now read like ${shortDate(SAMPLE, dateOrder)}`);
              }}
            >
              {DATE_ORDERS.map((o) => (
                <option key={o} value={o}>
                  {DATE_ORDER_WORDS[o]}
                </option>
              ))}
            </SelectField>
            <SelectField
              label="Write times as"
              value={data.clock}
              disabled={save.isPending}
              hint="Bake runs and their timers, the cooling record, run sheets, calendar files and e-mails. Time boxes you type in keep your device's own style."
              onChange={(e) => {
                const clock = e.target.value as ClockStyle;
                change({ clock }, data.version, `Times now read like ${clockText(SAMPLE_TIME, clock)}`);
              }}
            >
              {CLOCK_STYLES.map((c) => (
                <option key={c} value={c}>
                  {CLOCK_WORDS[c]}
                </option>
              ))}
            </SelectField>
            <SelectField
              label="Kitchen time zone"
              value={data.timeZone ?? ''}
              disabled={save.isPending}
              hint={
                data.timeZone
                  ? `Kitchen time now in ${zoneName(data.timeZone)}: ${kitchenTimeIn(data.timeZone)}. Trayline watches the cooling record at this time and e-mails every coach and kitchen assistant when a tray passes a cooling deadline with no reading showing it cooled, or is not written down 30 minutes after its planned time out.`
                  : 'Not set: cooling deadlines are watched only on the bake-run page while it is open. Set it to have Trayline e-mail every coach and kitchen assistant when a tray passes one with no reading showing it cooled.'
              }
              onChange={(e) => {
                const timeZone = e.target.value || null;
                change({ timeZone }, data.version, timeZone ? `Kitchen time zone: ${zoneName(timeZone)}` : 'Kitchen time zone not set: the cooling watch is off');
              }}
            >
              <option value="">Not set (no cooling e-mails)</option>
              {zoneGroups(data.timeZone).map(([region, zones]) => (
                <optgroup key={region} label={region}>
                  {zones.map((z) => (
                    <option key={z} value={z}>
                      {region === 'Other' ? z : placeOf(z)}
                    </option>
                  ))}
                </optgroup>
              ))}
            </SelectField>
            <DeviceZoneOffer current={data.timeZone} disabled={save.isPending} choose={(timeZone) => change({ timeZone }, data.version, `Kitchen time zone: ${zoneName(timeZone)}`)} />
            {stale && (
              <Notice tone="warn" title="Someone else changed the workspace settings">
                The current choice is shown again; choose once more to apply yours.
              </Notice>
            )}
          </div>
        )}
      </QueryView>
    </Card>
  );
}

/** "This device is in America/Chicago: use it" when the device's zone is not the kitchen's (a coach setting it up from the kitchen). */
function DeviceZoneOffer({ current, disabled, choose }: { current: string | null; disabled: boolean; choose: (zone: string) => void }) {
  const device = deviceTimeZone();
  if (!device || device === current) return null;
  return (
    <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
      This device is in {zoneName(device)}.
      <Button type="button" variant="secondary" size="sm" disabled={disabled} onClick={() => choose(device)}>
        Use this device’s time zone
      </Button>
    </p>
  );
}
