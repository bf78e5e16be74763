import { useEffect, useMemo, useRef, useState } from 'react';
import { Controller, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { DEFAULT_BAKE_RULES } from '@shared/domain/bake-rules-defaults';
import { FREEZER_MAX_F, STORAGE_DEFAULTS, REHEAT_MIN_F } from '@shared/domain/eat-by';
import { bothScales } from '@shared/domain/temperature';
import { STANDARD_PANS, STANDARD_PAN_CODES } from '@shared/domain/scaling';
import type { RecipeCalcInput } from '@shared/schemas/ingredients.schema';
import {
  PAN_LININGS,
  PAN_LINING_LABELS,
  TRAY_OVEN_LIMITS_F,
  trayInputSchema,
  type TrayDto,
  type TrayInput,
  type TrayValues,
} from '@shared/schemas/trays.schema';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Card, Notice } from '@/components/ui/states';
import { NewerVersionNotice, StaleEditNotice } from '@/components/ui/stale-edit-notice';
import { useReportDirty, type EditBase } from '@/lib/use-edit-base';
import { applyServerErrors } from '@/lib/form-errors';
import { ApiError } from '@/lib/problem';
import { IngredientCombobox, unitAfterPick, unitChoices, type PickedIngredient } from '@/components/domain/ingredient-combobox';
import { OvenTemperatureField } from '@/components/domain/oven-temperature-field';
import { useTempScale } from '@/lib/temp-scale';
import { NutritionPreview } from './nutrition-preview';
import { emptyTrayValues, trayToValues } from './tray-form-values';

type Form = ReturnType<typeof useForm<TrayInput, unknown, TrayValues>>;

interface Props {
  /** An existing tray: the version the typing started from (follows the newest while nothing is typed). */
  edit?: EditBase<TrayDto, TrayValues>;
  busy: boolean;
  /** Saves (with the version to save on, for an existing tray); resolves with the saved tray or rejects with the ApiError. */
  onSave: (values: TrayValues, version?: number) => Promise<TrayDto>;
  onSaved: (tray: TrayDto) => void;
  /** Told whether the form holds unsaved typing (the edit base's and the page's guard, for an existing tray). */
  onDirtyChange?: (dirty: boolean) => void;
}

/** Per-line facts the unit select needs (piece names, whether a volume can be weighed). */
type LineFacts = Record<number, PickedIngredient>;

export function TrayEditor({ edit, busy, onSave, onSaved, onDirtyChange }: Props) {
  const initial = edit?.base;
  const form: Form = useForm<TrayInput, unknown, TrayValues>({
    resolver: zodResolver(trayInputSchema),
    defaultValues: initial ? trayToValues(initial) : emptyTrayValues(),
  });
  // Ingredient names by id: the shown version's lines, and those picked here.
  const [picked, setPicked] = useState<Record<number, string>>({});
  const names = useMemo((): Record<number, string> => ({ ...Object.fromEntries((initial?.lines ?? []).map((l) => [l.ingredientId, l.ingredientName])), ...picked }), [initial, picked]);
  const [facts, setFacts] = useState<LineFacts>({});
  const [formError, setFormError] = useState<string | null>(null);
  const lines = useFieldArray({ control: form.control, name: 'lines' });
  const errors = form.formState.errors;
  useReportDirty(form.formState.isDirty, onDirtyChange);
  // The version shown changed (a newer one followed with nothing typed, theirs reloaded, this save): the form shows it,
  // reset in place (no remount: the keyboard stays where it was).
  const shown = useRef(initial?.version);
  useEffect(() => {
    if (!initial || initial.version === shown.current) return;
    shown.current = initial.version;
    form.reset(trayToValues(initial));
  }, [initial, form]);

  const save = async (values: TrayValues, version = edit?.sendVersion) => {
    setFormError(null);
    try {
      const saved = await onSave(values, version);
      form.reset(trayToValues(saved));
      edit?.saved(saved);
      onSaved(saved);
    } catch (err) {
      if (edit && err instanceof ApiError && err.status === 409 && err.problem.code === 'stale_version') {
        edit.refused(values, err.problem.current as TrayDto);
        return;
      }
      setFormError(applyServerErrors(err, form.setError, form.getValues()));
    }
  };
  const onSubmit = form.handleSubmit((values) => save(values));
  const held = edit?.held;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label="Base tray">
      {held ? (
        <StaleEditNotice what="tray" version={held.current.version} busy={busy} onReload={edit.reload} onKeep={() => void save(held.values, held.current.version)} />
      ) : (
        edit?.newerElsewhere && <NewerVersionNotice what="tray" version={edit.newerElsewhere.version} onReload={edit.reload} />
      )}
      {formError && <Notice tone="block" title={formError} />}

      <Card>
        <h2 className="mb-3 text-xl">Recipe</h2>
        <div className="grid gap-4">
          <TextField label="Name" error={errors.name?.message} {...form.register('name')} />
          <TextAreaField label="Description and method" rows={3} error={errors.description?.message} {...form.register('description')} />
        </div>
      </Card>

      <Card>
        <h2 className="mb-1 text-xl">Ingredients</h2>
        <p className="mb-3 text-sm text-ink-faint">
          Amounts as you would write them: 2, 1.5, 1 1/2, 1½, or a range like 1-2 (its middle is used). Allergens come from the
          ingredients.
        </p>
        {errors.lines?.message && <p role="alert" className="mb-2 font-bold text-signal">⚠ {errors.lines.message}</p>}
        <ol className="flex flex-col gap-3">
          {lines.fields.map((field, i) => (
            <LineRow
              key={field.id}
              form={form}
              index={i}
              count={lines.fields.length}
              name={names[form.getValues(`lines.${i}.ingredientId`) as number] ?? ''}
              facts={facts[form.getValues(`lines.${i}.ingredientId`) as number]}
              onPick={(ing) => {
                setPicked((n) => ({ ...n, [ing.id]: ing.name }));
                setFacts((f) => ({ ...f, [ing.id]: ing }));
              }}
              onMove={(to) => lines.move(i, to)}
              onRemove={() => lines.remove(i)}
            />
          ))}
        </ol>
        <Button
          type="button"
          variant="secondary"
          className="mt-3"
          onClick={() => lines.append({ ingredientId: 0, amountText: '', unit: 'g', note: '' }, { shouldFocus: false })}
        >
          Add an ingredient
        </Button>
      </Card>

      <PanAndBake form={form} />

      <Card>
        <h2 className="mb-3 text-xl">Storage and reheating</h2>
        <StorageFields form={form} />
      </Card>

      <Card>
        <h2 className="mb-1 text-xl">Live numbers per portion</h2>
        <LivePreview form={form} />
      </Card>

      <div className="no-print sticky bottom-0 flex gap-3 border-t border-line bg-paper/95 py-3">
        <Button type="submit" busy={busy}>
          {initial ? 'Save changes' : 'Create base tray'}
        </Button>
        {form.formState.isDirty && <span className="self-center text-sm text-ink-faint">Unsaved changes</span>}
      </div>
    </form>
  );
}

function LineRow(props: {
  form: Form;
  index: number;
  count: number;
  name: string;
  facts?: PickedIngredient;
  onPick: (ing: PickedIngredient) => void;
  onMove: (to: number) => void;
  onRemove: () => void;
}) {
  const { form, index: i, count, name, facts } = props;
  const err = form.formState.errors.lines?.[i];
  const id = useWatch({ control: form.control, name: `lines.${i}.ingredientId` }) as number;
  const unit = useWatch({ control: form.control, name: `lines.${i}.unit` }) as string;
  const units = useMemo(() => unitChoices(facts, unit), [facts, unit]);
  return (
    <li className="grid gap-2 rounded-lg border border-line p-3 sm:grid-cols-2 sm:items-start">
      <IngredientCombobox
        label={`Ingredient ${i + 1}`}
        value={id ? { id, name } : null}
        error={err?.ingredientId?.message}
        onPick={(ing) => {
          props.onPick(ing);
          form.setValue(`lines.${i}.ingredientId`, ing.id, { shouldDirty: true, shouldValidate: true });
          const next = unitAfterPick(ing, form.getValues(`lines.${i}.unit`));
          if (next !== form.getValues(`lines.${i}.unit`)) form.setValue(`lines.${i}.unit`, next, { shouldDirty: true });
        }}
      />
      <TextField label="Amount" inputMode="text" error={err?.amountText?.message} {...form.register(`lines.${i}.amountText`)} />
      {/* Controlled by the watched value: a unit chosen on pick shows even when its option appears only after the pick. */}
      <SelectField label="Unit" error={err?.unit?.message} {...form.register(`lines.${i}.unit`)} value={unit}>
        {units.map((u) => (
          <option key={u.code} value={u.code}>
            {u.label}
          </option>
        ))}
      </SelectField>
      <TextField label="Note" placeholder="e.g. chopped" error={err?.note?.message} {...form.register(`lines.${i}.note`)} />
      <div className="flex gap-1 sm:col-span-2" role="group" aria-label={`Line ${i + 1} actions`}>
        <Button type="button" size="sm" variant="ghost" disabled={i === 0} onClick={() => props.onMove(i - 1)} aria-label={`Move line ${i + 1} up`}>
          ↑
        </Button>
        <Button type="button" size="sm" variant="ghost" disabled={i === count - 1} onClick={() => props.onMove(i + 1)} aria-label={`Move line ${i + 1} down`}>
          ↓
        </Button>
        <Button type="button" size="sm" variant="ghost" onClick={props.onRemove} aria-label={`Remove line ${i + 1}`}>
          ✕
        </Button>
      </div>
    </li>
  );
}

function PanAndBake({ form }: { form: Form }) {
  const errors = form.formState.errors;
  const scale = useTempScale();
  const panCode = useWatch({ control: form.control, name: 'pan.code' });
  const cutKind = useWatch({ control: form.control, name: 'cutPlan.kind' });
  const cutErr = errors.cutPlan as Record<string, { message?: string }> | undefined;
  return (
    <Card>
      <h2 className="mb-3 text-xl">Pan, bake and cut</h2>
      <div className="grid gap-4 sm:grid-cols-3">
        <SelectField label="Pan" error={errors.pan?.code?.message} {...form.register('pan.code')}>
          {STANDARD_PAN_CODES.map((c) => (
            <option key={c} value={c}>
              {STANDARD_PANS[c].label}
            </option>
          ))}
          <option value="custom">Custom size</option>
        </SelectField>
        {panCode === 'custom' && (
          <>
            <TextField label="Pan length" inputMode="decimal" error={errors.pan?.length?.message} {...form.register('pan.length')} />
            <TextField label="Pan width" inputMode="decimal" error={errors.pan?.width?.message} {...form.register('pan.width')} />
            <SelectField label="Pan unit" {...form.register('pan.unit')}>
              <option value="in">inches</option>
              <option value="cm">centimetres</option>
            </SelectField>
          </>
        )}
        <SelectField label="Pan lining" error={errors.panLining?.message} {...form.register('panLining')}>
          {PAN_LININGS.map((l) => (
            <option key={l} value={l}>
              {PAN_LINING_LABELS[l]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Bake category"
          hint="Choosing one fills in its usual temperature and times; change them for this tray if needed."
          error={errors.bake?.category?.message}
          {...form.register('bake.category', {
            onChange: (e) => {
              const rule = DEFAULT_BAKE_RULES.find((r) => r.category === e.target.value);
              if (!rule) return;
              form.setValue('bake.tempF', rule.tempF, { shouldDirty: true });
              form.setValue('bake.minMinutes', rule.minMinutes, { shouldDirty: true });
              form.setValue('bake.maxMinutes', rule.maxMinutes, { shouldDirty: true });
            },
          })}
        >
          {DEFAULT_BAKE_RULES.map((r) => (
            <option key={r.category} value={r.category}>
              {r.label}
            </option>
          ))}
        </SelectField>
        <Controller
          control={form.control}
          name="bake.tempF"
          render={({ field, fieldState }) => (
            <OvenTemperatureField
              scale={scale}
              name={field.name}
              valueF={field.value}
              onChangeF={field.onChange}
              onBlur={field.onBlur}
              error={fieldState.error?.message}
              limitsF={TRAY_OVEN_LIMITS_F}
            />
          )}
        />
        <div className="grid grid-cols-2 gap-2">
          <TextField label="Shortest (min)" inputMode="numeric" error={errors.bake?.minMinutes?.message} {...form.register('bake.minMinutes')} />
          <TextField label="Longest (min)" inputMode="numeric" error={errors.bake?.maxMinutes?.message} {...form.register('bake.maxMinutes')} />
        </div>
        <TextField
          label="Cooked-yield factor"
          inputMode="decimal"
          hint="Cooked weight ÷ raw weight, e.g. 0.9 for an egg slab, 0.35 for bacon. It changes grams per portion, not the nutrients."
          error={errors.yieldFactor?.message}
          {...form.register('yieldFactor')}
        />
        <fieldset className="flex flex-col gap-2 sm:col-span-3">
          <legend className="text-sm font-bold">Cut plan</legend>
          <div className="flex flex-wrap gap-4">
            <label className="flex min-h-11 items-center gap-2">
              <input type="radio" value="grid" {...form.register('cutPlan.kind')} /> Rows × columns
            </label>
            <label className="flex min-h-11 items-center gap-2">
              <input type="radio" value="pieces" {...form.register('cutPlan.kind')} /> N pieces of equal weight
            </label>
          </div>
          {cutKind === 'pieces' ? (
            <TextField label="Pieces" inputMode="numeric" error={cutErr?.pieces?.message} {...form.register('cutPlan.pieces' as 'cutPlan.kind')} />
          ) : (
            <div className="grid grid-cols-2 gap-2 sm:max-w-md">
              <TextField label="Rows" inputMode="numeric" error={cutErr?.rows?.message} {...form.register('cutPlan.rows' as 'cutPlan.kind')} />
              <TextField label="Columns" inputMode="numeric" error={cutErr?.columns?.message} {...form.register('cutPlan.columns' as 'cutPlan.kind')} />
            </div>
          )}
        </fieldset>
      </div>
    </Card>
  );
}

function StorageFields({ form }: { form: Form }) {
  const errors = form.formState.errors;
  const scale = useTempScale();
  const egg = STORAGE_DEFAULTS['egg-dish'];
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <TextField
        label="Fridge days"
        inputMode="numeric"
        hint={`Prep day is day 0. ${egg.source}.`}
        error={errors.storage?.fridgeDays?.message}
        {...form.register('storage.fridgeDays')}
      />
      <TextField
        label="Freezer weeks (quality)"
        inputMode="numeric"
        hint={`Food kept at ${bothScales(FREEZER_MAX_F, scale)} stays safe; the time is for quality.`}
        error={errors.storage?.freezerWeeks?.message}
        {...form.register('storage.freezerWeeks')}
      />
      <Controller
        control={form.control}
        name="reheatSteps"
        render={({ field, fieldState }) => (
          <TextAreaField
            className="sm:col-span-2"
            label="Reheat steps (one per line)"
            rows={3}
            hint={`Every step ends with all parts at ${bothScales(REHEAT_MIN_F, scale)} or above (FDA Food Code 3-403.11).`}
            error={fieldState.error?.message ?? (errors.reheatSteps as { message?: string }[] | undefined)?.find?.((e) => e?.message)?.message}
            value={((field.value as string[] | undefined) ?? []).join('\n')}
            onChange={(e) => field.onChange(e.target.value.split('\n').map((s) => s.trimStart()).filter((s, i, all) => s !== '' || i === all.length - 1))}
            onBlur={() => {
              field.onChange(((field.value as string[] | undefined) ?? []).map((s) => s.trim()).filter(Boolean));
              field.onBlur();
            }}
          />
        )}
      />
      <Controller
        control={form.control}
        name="tags"
        render={({ field, fieldState }) => (
          <TagsField value={(field.value as string[] | undefined) ?? []} onChange={field.onChange} error={fieldState.error?.message} />
        )}
      />
    </div>
  );
}

const tagsOf = (text: string) => text.split(',').map((t) => t.trim().toLowerCase()).filter(Boolean);

function TagsField({ value, onChange, error }: { value: string[]; onChange: (v: string[]) => void; error?: string }) {
  const [text, setText] = useState(value.join(', '));
  const [seen, setSeen] = useState(value);
  // Tags set from outside (the form reset to a newer version, theirs reloaded) show; what was typed stays as typed.
  if (value !== seen) {
    setSeen(value);
    if (tagsOf(text).join(',') !== value.join(',')) setText(value.join(', '));
  }
  return (
    <TextField
      className="sm:col-span-2"
      label="Tags"
      hint="Separate with commas, e.g. breakfast, egg-free"
      error={error}
      value={text}
      onChange={(e) => {
        setText(e.target.value);
        onChange(tagsOf(e.target.value));
      }}
    />
  );
}

function LivePreview({ form }: { form: Form }) {
  const lines = useWatch({ control: form.control, name: 'lines' });
  const cut = useWatch({ control: form.control, name: 'cutPlan' });
  const yieldFactor = useWatch({ control: form.control, name: 'yieldFactor' });
  const input = useMemo<RecipeCalcInput | null>(() => {
    const items = (lines ?? [])
      .filter((l) => Number(l.ingredientId) > 0 && String(l.amountText ?? '').trim() !== '')
      .map((l) => ({ ingredientId: Number(l.ingredientId), amount: String(l.amountText), unit: String(l.unit) }));
    if (!items.length) return null;
    const c = cut as { kind: string; rows?: unknown; columns?: unknown; pieces?: unknown } | undefined;
    const portions = c?.kind === 'pieces' ? Number(c.pieces) : Number(c?.rows) * Number(c?.columns);
    if (!Number.isInteger(portions) || portions < 1) return null;
    const y = String(yieldFactor ?? '').trim();
    return { items, portions, yieldFactor: y === '' ? undefined : y };
  }, [lines, cut, yieldFactor]);
  return <NutritionPreview input={input} />;
}
