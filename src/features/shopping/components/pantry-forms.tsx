import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import type { IngredientDto } from '@shared/schemas/ingredients.schema';
import {
  pantryCreateSchema,
  type PantryCreateInput,
  type PantryCreateValues,
  type PantryItemDto,
} from '@shared/schemas/shopping.schema';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { StaleEditNotice } from '@/components/ui/stale-edit-notice';
import { applyServerErrors } from '@/lib/form-errors';
import { errorMessage, isApiError, markShown } from '@/lib/problem';
import { GRAMS_PER_UNIT, unitSymbol } from '@shared/domain/units';
import { pantryIngredientSearchQuery } from '../api/shopping.queries';
import { useCreatePantryItem, useDeletePantryItem, useUpdatePantryItem } from '../api/use-pantry-mutations';

const MASS = ['g', 'kg', 'oz', 'lb'];
const GRAMS_PER_OZ = GRAMS_PER_UNIT.oz.toNumber();
const VOLUME = ['ml', 'l', 'tsp', 'tbsp', 'cup', 'pint', 'quart'];

/** The piece a count-bought item is bought in (eggs: "large"), or null when it is bought by mass or volume. */
function purchasePiece(ing: Pick<IngredientDto, 'purchase'> | null): string | null {
  const unit = ing?.purchase?.unit;
  return unit && !MASS.includes(unit) && !VOLUME.includes(unit) ? unit : null;
}

/** Units an ingredient can be counted in: mass always, volume with a density, its pieces. */
export function unitsFor(ing: Pick<IngredientDto, 'densityGPerMl' | 'pieceWeights' | 'purchase'> | null): string[] {
  if (!ing) return MASS;
  const pieces = Object.keys(ing.pieceWeights ?? {});
  const bought = purchasePiece(ing);
  return [...new Set([...(bought ? [bought] : []), ...pieces, ...MASS, ...(ing.densityGPerMl ? VOLUME : [])])];
}

/** The unit a new pantry amount starts in: the piece a count-bought item is bought in, else the reader's mass unit. */
export function startingUnit(ing: Pick<IngredientDto, 'purchase'> | null, system: 'us' | 'metric'): string {
  return purchasePiece(ing) ?? (system === 'metric' ? 'g' : 'oz');
}

/** `unitSystem`: the reader's measures (a new amount starts in ounces or grams). */
export function AddPantryItem({ unitSystem }: { unitSystem: 'us' | 'metric' }) {
  const [search, setSearch] = useState('');
  const results = useQuery(pantryIngredientSearchQuery(search.trim()));
  const create = useCreatePantryItem();
  const [formError, setFormError] = useState<string | null>(null);
  const empty = { ingredientId: '' as unknown as number, amount: '', unit: startingUnit(null, unitSystem) };
  const form = useForm<PantryCreateInput, unknown, PantryCreateValues>({
    resolver: zodResolver(pantryCreateSchema),
    defaultValues: empty,
  });
  const chosenId = Number(useWatch({ control: form.control, name: 'ingredientId' }));
  const chosen = results.data?.items.find((i) => i.id === chosenId) ?? null;
  const ingredientField = form.register('ingredientId', {
    // A newly chosen ingredient starts in its own unit (eggs in "large"), not in the last one's.
    onChange: (e: { target: { value: string } }) => {
      const ing = results.data?.items.find((i) => i.id === Number(e.target.value)) ?? null;
      form.setValue('unit', startingUnit(ing, unitSystem));
    },
  });
  const submit = form.handleSubmit((values) => {
    setFormError(null);
    create.mutate(values, {
      onSuccess: () => form.reset(empty),
      onError: (e) => setFormError(isApiError(e, 409) ? errorMessage(e) : applyServerErrors(e, form.setError, form.getValues())),
    });
  });
  const err = form.formState.errors;
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" noValidate>
      <TextField label="Find an ingredient" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="eggs, cream cheese…" />
      <SelectField label="Ingredient" error={err.ingredientId?.message} {...ingredientField}>
        <option value="">Choose…</option>
        {results.data?.items.map((i) => (
          <option key={i.id} value={i.id}>
            {i.name}
          </option>
        ))}
      </SelectField>
      <TextField label="Amount on hand" inputMode="decimal" error={err.amount?.message} {...form.register('amount')} />
      <SelectField label="Unit" error={err.unit?.message} {...form.register('unit')}>
        {unitsFor(chosen).map((u) => (
          <option key={u} value={u}>
            {unitSymbol(u)}
          </option>
        ))}
      </SelectField>
      {formError && (
        <div className="sm:col-span-2">
          <Notice tone="warn">{formError}</Notice>
        </div>
      )}
      <div className="sm:col-span-2">
        <Button type="submit" busy={create.isPending}>
          Add to pantry
        </Button>
      </div>
    </form>
  );
}

/**
 * Where a pantry row's amount field starts: a US reader's grams in ounces (to 0.01 oz), anything else as stored
 * (grams for a metric reader, pieces for count-bought items).
 */
export function startingAmount(item: Pick<PantryItemDto, 'amount' | 'unit'>, system: 'us' | 'metric'): { amount: string; unit: string } {
  if (item.unit === 'g' && system === 'us') return { amount: String(Math.round((item.amount / GRAMS_PER_OZ) * 100) / 100), unit: 'oz' };
  return { amount: String(Math.round(item.amount * 100) / 100), unit: item.unit };
}

/**
 * One pantry row: change the amount (in any unit the ingredient knows) or remove it. The amount typed stays on the
 * version it started from: a refreshed list under it changes nothing typed (with nothing typed, the row shows the
 * newest), and a save over someone else's change is refused and asks.
 */
export function PantryRow({ item, unitSystem }: { item: PantryItemDto; unitSystem: 'us' | 'metric' }) {
  const update = useUpdatePantryItem();
  const remove = useDeletePantryItem();
  const [base, setBase] = useState(item);
  const [amount, setAmount] = useState(() => startingAmount(item, unitSystem).amount);
  const [unit, setUnit] = useState(() => startingAmount(item, unitSystem).unit);
  const [theirs, setTheirs] = useState<PantryItemDto | null>(null);
  const [error, setError] = useState<string | null>(null);
  const show = (row: PantryItemDto) => {
    const start = startingAmount(row, unitSystem);
    setBase(row);
    setAmount(start.amount);
    setUnit(start.unit);
    setTheirs(null);
  };
  const shown = startingAmount(base, unitSystem);
  const typed = amount !== shown.amount || unit !== shown.unit;
  // Nothing typed: the row follows the newest version (adjusted while rendering).
  if (!typed && !theirs && item.version > base.version) show(item);
  const units = [...new Set([item.unit, ...MASS])];
  const save = (version = base.version) => {
    setError(null);
    update.mutate(
      { id: item.id, amount, unit, version },
      {
        onSuccess: show,
        onError: (e) => {
          markShown(e);
          if (isApiError(e, 409) && e.problem.code === 'stale_version' && e.problem.current) setTheirs(e.problem.current as PantryItemDto);
          else setError(errorMessage(e));
        },
      },
    );
  };
  return (
    <li className="flex flex-col gap-2 rounded-lg border border-line-strong bg-paper-card p-3">
      <div className="flex items-baseline justify-between gap-2">
        <span className="font-bold">{item.ingredientName}</span>
        <span className="num text-ink-soft">{item.display}</span>
      </div>
      <div className="flex flex-wrap items-end gap-2">
        <TextField label="Amount" className="w-32" inputMode="decimal" value={amount} onChange={(e) => setAmount(e.target.value)} />
        <SelectField label="Unit" className="w-28" value={unit} onChange={(e) => setUnit(e.target.value)}>
          {units.map((u) => (
            <option key={u} value={u}>
              {unitSymbol(u)}
            </option>
          ))}
        </SelectField>
        <Button variant="secondary" busy={update.isPending} onClick={() => save()}>
          Save
        </Button>
        <Button variant="ghost" busy={remove.isPending} onClick={() => remove.mutate(item.id)}>
          Remove <span className="sr-only">{item.ingredientName}</span>
        </Button>
      </div>
      {theirs && (
        <StaleEditNotice what={`amount (now ${theirs.display})`} version={theirs.version} busy={update.isPending} onReload={() => show(theirs)} onKeep={() => save(theirs.version)} />
      )}
      {error && <Notice tone="warn">{error}</Notice>}
    </li>
  );
}
