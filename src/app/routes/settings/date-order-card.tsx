import { useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from 'sonner';
import { DATE_ORDERS, shortDate, type DateOrder } from '@shared/domain/iso-date';
import { SelectField } from '@/components/ui/field';
import { Card, Notice, QueryView, Skeleton } from '@/components/ui/states';
import { isApiError, markShown } from '@/lib/problem';
import { workspaceSettingsQuery } from '@/features/ingredients/api/ingredients.queries';
import { useUpdateWorkspaceSettings } from '@/features/ingredients/api/use-ingredient-mutations';

/** A sample day for the choices (a Monday; any date shows the order). */
const SAMPLE = '2026-12-07';

const DATE_ORDER_WORDS: Record<DateOrder, string> = {
  'month-day': `${shortDate(SAMPLE, 'month-day')} (month first)`,
  'day-month': `${shortDate(SAMPLE, 'day-month')} (day first)`,
};

/**
 * How the workspace writes dates (coach only): every page, printed label, PDF, calendar file and e-mail follows it,
 * for everyone in the workspace. Saved on change, like the units.
 */
export function DateOrderCard() {
  const qc = useQueryClient();
  const settings = useQuery(workspaceSettingsQuery());
  const save = useUpdateWorkspaceSettings();
  const [stale, setStale] = useState(false);
  return (
    <Card>
      <h2 className="mb-3 text-xl">Dates</h2>
      <QueryView query={settings} loading={<Skeleton className="h-16 w-full" label="Loading the date setting" />}>
        {(data) => (
          <div className="flex flex-col gap-3">
            <SelectField
              label="Write dates as"
              value={data.dateOrder}
              disabled={save.isPending}
              hint="For everyone in this workspace: pages, labels, shopping lists, bake runs, plan PDFs and e-mails. Plans already e-mailed keep the words they left with."
              onChange={(e) => {
                const dateOrder = e.target.value as DateOrder;
                setStale(false);
                save.mutate(
                  { dateOrder, version: data.version },
                  {
                    // Server-written words (week names, messages) change too: read everything again.
                    onSuccess: () => {
                      toast.success(`Dates now read like ${shortDate(SAMPLE, dateOrder)}`);
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
              }}
            >
              {DATE_ORDERS.map((o) => (
                <option key={o} value={o}>
                  {DATE_ORDER_WORDS[o]}
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
