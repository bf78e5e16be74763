import { useId, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { toast } from 'sonner';
import type { NetCarbRuleKind } from '@shared/domain/nutrition';
import { Button } from '@/components/ui/button';
import { Card, Notice, QueryView, Skeleton } from '@/components/ui/states';
import { isApiError, markShown } from '@/lib/problem';
import { workspaceSettingsQuery } from '../api/ingredients.queries';
import { useUpdateWorkspaceSettings } from '../api/use-ingredient-mutations';

/** The coach's net-carb rule (a workspace setting), with the reminder that no regulation defines net carbs. */
export function NetCarbRuleCard() {
  const groupId = useId();
  const settings = useQuery(workspaceSettingsQuery());
  const save = useUpdateWorkspaceSettings();
  const [choice, setChoice] = useState<NetCarbRuleKind | null>(null);
  const [stale, setStale] = useState(false);
  // The saved rule becomes the choice whenever it is read (again).
  const [readData, setReadData] = useState(settings.data);
  if (readData !== settings.data) {
    setReadData(settings.data);
    if (settings.data) setChoice(settings.data.netCarbRule);
  }

  return (
    <Card>
      <h2 id={groupId} className="mb-3 text-xl">Net carbs</h2>
      <QueryView
        query={settings}
        loading={<Skeleton className="h-24 w-full" />}
      >
        {(data) => (
          <form
            className="flex flex-col gap-3"
            onSubmit={(e) => {
              e.preventDefault();
              if (!choice) return;
              setStale(false);
              save.mutate(
                { netCarbRule: choice, version: data.version },
                {
                  onSuccess: () => toast.success('Net-carb rule saved; every net-carb number now uses it'),
                  onError: (err) => {
                    if (isApiError(err, 409)) {
                      markShown(err); // the stale notice says it
                      setStale(true);
                      void settings.refetch();
                    }
                  },
                },
              );
            }}
          >
            <Notice tone="info">{data.help}</Notice>
            <fieldset aria-labelledby={groupId} className="flex flex-col gap-2">
              {data.netCarbRules.map((r) => (
                <label key={r.kind} className="flex min-h-11 items-start gap-3 rounded-lg border border-line p-3 has-[:checked]:border-ink">
                  <input
                    type="radio"
                    name="netCarbRule"
                    value={r.kind}
                    checked={choice === r.kind}
                    onChange={() => setChoice(r.kind)}
                    className="mt-1 h-5 w-5"
                  />
                  <span>
                    <span className="font-bold">{r.label}</span>
                    <span className="block text-sm text-ink-soft">{r.formula}</span>
                  </span>
                </label>
              ))}
            </fieldset>
            {stale && (
              <Notice tone="warn" title="Someone else changed this setting">
                The current choice is shown again; save once more to apply yours.
              </Notice>
            )}
            <Button type="submit" busy={save.isPending} disabled={choice === data.netCarbRule} className="self-start">
              Save rule
            </Button>
          </form>
        )}
      </QueryView>
    </Card>
  );
}
