import { energyShares } from '@shared/domain/nutrition';
import type { RecipeCalcInput } from '@shared/schemas/ingredients.schema';
import { Notice } from '@/components/ui/states';
import { ApiError } from '@/lib/problem';
import { useLivePreview } from '@/lib/use-live-preview';
import { useRecipePreview } from '../api/use-tray-mutations';

/**
 * Live numbers while the coach edits: POST /api/calc/recipe, debounced (500 ms after the last change).
 * Shows per-portion macros under the workspace's net-carb rule; a line the server cannot weigh is named.
 */
export function NutritionPreview({ input }: { input: RecipeCalcInput | null }) {
  const preview = useRecipePreview();
  useLivePreview(input, preview);

  if (!input) {
    return <p className="text-sm text-ink-faint">Add ingredients with amounts to see the numbers per portion.</p>;
  }
  const data = preview.data;
  const problem = preview.error instanceof ApiError ? preview.error : null;
  const shares = data ? energyShares(data.perPortion) : null;
  return (
    <div aria-live="polite" aria-busy={preview.isPending} className="flex flex-col gap-3">
      {problem && (
        <Notice tone="warn" title="The numbers cannot be worked out yet">
          {Object.values(problem.fieldErrors).flat()[0] ?? problem.message}
        </Notice>
      )}
      {data && (
        <>
          <dl className="grid grid-cols-3 gap-2 sm:grid-cols-6">
            {[
              ['kcal', data.perPortion.kcal, ''],
              ['Fat', data.perPortion.fatG, 'g'],
              ['Protein', data.perPortion.proteinG, 'g'],
              ['Carbs', data.perPortion.carbsG, 'g'],
              ['Net carbs', data.perPortion.netCarbsG, 'g'],
              ['Grams', data.perPortion.massG, 'g'],
            ].map(([label, v, u]) => (
              <div key={label as string} className="rounded-lg bg-paper-deep p-2">
                <dt className="text-xs font-bold uppercase text-ink-faint">{label}</dt>
                <dd className="num text-lg font-bold">
                  {(v as number).toFixed(1)}
                  {u && <span className="text-sm font-normal"> {u}</span>}
                </dd>
              </div>
            ))}
          </dl>
          {shares && (
            <p className="num text-sm text-ink-soft">
              Energy from fat {shares.fatPct} %, protein {shares.proteinPct} %, carbs {shares.carbsPct} % · per portion of{' '}
              {data.portions} · net carbs: {data.netCarbRule.replace(/-/g, ' ')} rule
            </p>
          )}
        </>
      )}
      {preview.isPending && !data && <p className="text-sm text-ink-faint">Working out the numbers…</p>}
    </div>
  );
}
