import { useState } from 'react';
import { useFieldArray, useForm, useWatch } from 'react-hook-form';
import { useReportDirty } from '@/lib/use-edit-base';
import { zodResolver } from '@hookform/resolvers/zod';
import { MAJOR_ALLERGENS } from '@shared/domain/allergens';
import {
  INGREDIENT_CATEGORIES,
  INGREDIENT_CATEGORY_LABELS,
  dollarsText,
  ingredientFormSchema,
  STORE_AISLE_CODES,
  STORE_AISLE_LABELS,
  type IngredientDto,
  type IngredientInput,
  type IngredientValues,
} from '@shared/schemas/ingredients.schema';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';

type FieldPath = Parameters<ReturnType<typeof useForm<IngredientInput, unknown, IngredientValues>>['register']>[0];

const s = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

/** Form values of an existing ingredient (numbers as text, piece weights as rows). */
export function formValuesOf(dto: IngredientDto): IngredientInput {
  return {
    name: dto.name,
    category: dto.category,
    kcal: s(dto.per100g.kcal),
    fatG: s(dto.per100g.fatG),
    satFatG: s(dto.per100g.satFatG),
    proteinG: s(dto.per100g.proteinG),
    carbsG: s(dto.per100g.carbsG),
    fiberG: s(dto.per100g.fiberG),
    sugarsG: s(dto.per100g.sugarsG),
    erythritolG: s(dto.per100g.erythritolG),
    alluloseG: s(dto.per100g.alluloseG),
    otherPolyolsG: s(dto.per100g.otherPolyolsG),
    sodiumMg: s(dto.per100g.sodiumMg),
    densityGPerMl: s(dto.densityGPerMl),
    densitySource: dto.densitySource ?? '',
    pieceWeights: Object.entries(dto.pieceWeights).map(([name, grams]) => ({ name, grams: String(grams) })),
    allergens: dto.allergens,
    purchase: dto.purchase ? { amount: String(dto.purchase.amount), unit: dto.purchase.unit, label: dto.purchase.label } : null,
    // Typed in dollars; the form's schema gives cents back.
    priceCents: dollarsText(dto.priceCents),
    aisle: dto.aisle ?? '',
    source: dto.source,
    note: dto.note ?? '',
  };
}

export const EMPTY_INGREDIENT: IngredientInput = {
  name: '',
  category: 'other',
  kcal: '',
  fatG: '',
  satFatG: '0',
  proteinG: '',
  carbsG: '',
  fiberG: '0',
  sugarsG: '0',
  erythritolG: '0',
  alluloseG: '0',
  otherPolyolsG: '0',
  sodiumMg: '0',
  densityGPerMl: '',
  densitySource: '',
  pieceWeights: [],
  allergens: [],
  purchase: null,
  priceCents: '',
  aisle: '',
  source: '',
  note: '',
};

/**
 * Create or edit a workspace-own ingredient with the API's own zod schema; server 400s land on the fields.
 * `onSave` returns the mutation promise; its rejection is mapped onto the form here.
 */
export function IngredientForm({
  initial,
  submitLabel,
  onSave,
  busy,
  onDirtyChange,
}: {
  initial: IngredientInput;
  submitLabel: string;
  onSave: (values: IngredientValues) => Promise<unknown>;
  busy?: boolean;
  /** Told whether the form holds unsaved typing. */
  onDirtyChange?: (dirty: boolean) => void;
}) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<IngredientInput, unknown, IngredientValues>({
    resolver: zodResolver(ingredientFormSchema),
    defaultValues: initial,
  });
  const { register, formState, setValue, control } = form;
  useReportDirty(formState.isDirty, onDirtyChange);
  const pieces = useFieldArray({ control, name: 'pieceWeights' as never });
  const errors = formState.errors as Record<string, unknown>;
  const errorAt = (path: string): string | undefined => {
    let cur: unknown = errors;
    for (const part of path.split('.')) cur = (cur as Record<string, unknown> | undefined)?.[part];
    return (cur as { message?: string } | undefined)?.message;
  };
  const purchase = useWatch({ control, name: 'purchase' });

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSave(values);
    } catch (err) {
      setFormError(applyServerErrors(err, form.setError, form.getValues()));
    }
  });

  const num = (name: FieldPath, label: string, hint?: string) => (
    <TextField label={label} inputMode="decimal" autoComplete="off" hint={hint} error={errorAt(name)} className="num" {...register(name)} />
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
      {formError && <Notice tone="block" title={formError} />}
      {Object.keys(formState.errors).length > 0 && formState.isSubmitted && (
        <Notice tone="block" title="Some fields need a look">The problems are shown beside each field.</Notice>
      )}
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-xl font-display">About it</legend>
        <TextField label="Name" error={errorAt('name')} {...register('name')} />
        <SelectField label="Category" error={errorAt('category')} {...register('category')}>
          {INGREDIENT_CATEGORIES.map((c) => (
            <option key={c} value={c}>{INGREDIENT_CATEGORY_LABELS[c]}</option>
          ))}
        </SelectField>
        <TextField
          label="Source of the values"
          hint='Where the numbers come from, e.g. "package label" or "USDA FoodData Central 171287".'
          error={errorAt('source')}
          className="sm:col-span-2"
          {...register('source')}
        />
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-xl font-display">Per 100 g</legend>
        {num('kcal', 'Energy (kcal)')}
        {num('fatG', 'Fat (g)')}
        {num('satFatG', 'Saturated fat (g)')}
        {num('proteinG', 'Protein (g)')}
        {num('carbsG', 'Total carbohydrate (g)', 'US style: includes fiber, sugar alcohols and allulose.')}
        {num('fiberG', 'Dietary fiber (g)')}
        {num('sugarsG', 'Total sugars (g)')}
        {num('erythritolG', 'Erythritol (g)')}
        {num('alluloseG', 'Allulose (g)')}
        {num('otherPolyolsG', 'Other sugar alcohols (g)', 'Maltitol, xylitol, sorbitol…')}
        {num('sodiumMg', 'Sodium (mg)')}
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-xl font-display">Allergens</legend>
        <p className="text-sm text-ink-soft">The nine major US food allergens (FALCPA 2004 and the FASTER Act 2021). The package label always wins.</p>
        <div className="grid gap-2 sm:grid-cols-3">
          {MAJOR_ALLERGENS.map((a) => (
            <label key={a.code} className="flex min-h-11 items-center gap-2">
              <input type="checkbox" value={a.code} className="h-5 w-5" {...register('allergens')} />
              {a.label}
            </label>
          ))}
        </div>
        {errorAt('allergens') && <p role="alert" className="text-sm font-bold text-signal">⚠ {errorAt('allergens')}</p>}
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-xl font-display">Measuring</legend>
        {num('densityGPerMl', 'Density (g per mL)', 'Needed to measure it by cup or spoon. Leave empty when unknown.')}
        <TextField label="Where the density comes from" error={errorAt('densitySource')} {...register('densitySource')} />
        <div className="flex flex-col gap-2 sm:col-span-2">
          <p className="text-sm font-bold">Piece weights</p>
          <p className="text-sm text-ink-soft">Grams of one named piece, e.g. “large” = 50 for eggs, “slice” = 28.</p>
          {pieces.fields.map((f, i) => (
            <div key={f.id} className="grid grid-cols-[1fr_1fr_auto] items-end gap-2">
              <TextField label={`Piece ${i + 1} name`} error={errorAt(`pieceWeights.${i}.name`)} {...register(`pieceWeights.${i}.name` as FieldPath)} />
              <TextField label="Grams" inputMode="decimal" error={errorAt(`pieceWeights.${i}.grams`)} {...register(`pieceWeights.${i}.grams` as FieldPath)} />
              <Button type="button" variant="ghost" onClick={() => pieces.remove(i)} aria-label={`Remove piece ${i + 1}`}>
                Remove
              </Button>
            </div>
          ))}
          <Button type="button" variant="secondary" size="sm" className="self-start" onClick={() => pieces.append({ name: '', grams: '' } as never)}>
            Add a piece weight
          </Button>
        </div>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-xl font-display">Buying</legend>
        <label className="flex min-h-11 items-center gap-2 sm:col-span-3">
          <input
            type="checkbox"
            className="h-5 w-5"
            checked={purchase !== null && purchase !== undefined}
            onChange={(e) => setValue('purchase', e.target.checked ? { amount: '', unit: 'oz', label: '' } : null, { shouldDirty: true })}
          />
          Bought in a package (for the shopping list)
        </label>
        {purchase && (
          <>
            <TextField label="Package size" inputMode="decimal" error={errorAt('purchase.amount')} {...register('purchase.amount')} />
            <TextField
              label="Unit"
              hint="g, kg, oz, lb, ml, l, cup, pint, quart, each, or one of the piece names."
              error={errorAt('purchase.unit')}
              {...register('purchase.unit')}
            />
            <TextField label="Package label" hint='e.g. "8 oz block", "dozen large eggs"' error={errorAt('purchase.label')} {...register('purchase.label')} />
          </>
        )}
        <TextField
          label="Price per package ($)"
          inputMode="decimal"
          hint="Optional, e.g. 3.99."
          error={errorAt('priceCents')}
          {...register('priceCents')}
        />
        <SelectField label="Store aisle" error={errorAt('aisle')} {...register('aisle')}>
          <option value="">—</option>
          {STORE_AISLE_CODES.map((a) => (
            <option key={a} value={a}>{STORE_AISLE_LABELS[a]}</option>
          ))}
        </SelectField>
      </fieldset>

      <TextAreaField label="Note" rows={3} error={errorAt('note')} {...register('note')} />

      <Button type="submit" busy={busy || formState.isSubmitting} className="self-start">
        {submitLabel}
      </Button>
    </form>
  );
}
