import { useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from 'sonner';
import { DATE_ORDERS, shortDate, type DateOrder } from '@shared/domain/iso-date';
import { CLOCK_STYLES, clockText, type ClockStyle } from '@shared/domain/clock';
import type { WorkspaceSettingsUpdateInput } from '@shared/schemas/ingredients.schema';
import { SelectField } from '@/components/ui/field';
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
