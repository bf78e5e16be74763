import { useMemo, useState } from 'react';
import { useFieldArray, useForm, useWatch, type UseFormReturn, type UseFormSetError } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { createAssemblySchema, type AssemblyDto, type AssemblyInput, type AssemblyValues } from '@shared/schemas/assemblies.schema';
import { trayOptionsQuery } from '../api/assemblies.queries';
import { IngredientCombobox, unitAfterPick, unitChoices, type PickedIngredient } from '@/components/domain/ingredient-combobox';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { PlatePreview, previewParts } from './plate-preview';
import { useTempScale } from '@/lib/temp-scale';
import { useReportDirty } from '@/lib/use-edit-base';
import { bothScales } from '@shared/domain/temperature';
import { REHEAT_MIN_F } from '@shared/domain/eat-by';

export const emptyAssembly: AssemblyInput = { name: '', description: '', trays: [], addOns: [], assemblySteps: [], reheatSteps: [] };

export function assemblyToInput(a: AssemblyDto): AssemblyInput {
  return {
    name: a.name,
    description: a.description,
    trays: a.trays.map((t) => ({ trayId: t.trayId, portions: t.portions })),
    addOns: a.addOns.map((x) => ({ ingredientId: x.ingredientId, amountText: x.amountText, unit: x.unit, note: x.note })),
    assemblySteps: a.assemblySteps,
    reheatSteps: a.reheatSteps,
  };
}

const linesToSteps = (t: string) => t.split('\n').map((s) => s.trim()).filter(Boolean);

interface Props {
  initial: AssemblyInput;
  names?: Record<number, string>;
  /** The plate's own base trays by id (an archived one is no longer among the options but stays choosable here). */
  trayNames?: Record<number, string>;
  busy?: boolean;
  formError?: string | null;
  onSubmit: (v: AssemblyValues, setError: UseFormSetError<AssemblyInput>) => void;
  /** Told whether the form holds unsaved typing (the steps' text areas included). */
  onDirtyChange?: (dirty: boolean) => void;
}

type PlateForm = UseFormReturn<AssemblyInput, unknown, AssemblyValues>;

/** One add-on: the library's combobox, an amount, a unit the ingredient can be weighed in, a note. */
function AddOnRow({ form, index: i, initialName, onRemove }: { form: PlateForm; index: number; initialName?: string; onRemove: () => void }) {
  const [facts, setFacts] = useState<PickedIngredient | null>(null);
  const id = useWatch({ control: form.control, name: `addOns.${i}.ingredientId` }) as number;
  const unit = useWatch({ control: form.control, name: `addOns.${i}.unit` }) as string;
  const [name, setName] = useState(initialName ?? '');
  const units = useMemo(() => unitChoices(facts, unit), [facts, unit]);
  const err = form.formState.errors.addOns?.[i];
  return (
    <div className="grid items-end gap-2 sm:grid-cols-[2fr_1fr_1fr_1fr_auto]">
      <IngredientCombobox
        label="Ingredient"
        value={id ? { id, name } : null}
        error={err?.ingredientId?.message}
        onPick={(ing) => {
          setFacts(ing);
          setName(ing.name);
          form.setValue(`addOns.${i}.ingredientId`, ing.id, { shouldDirty: true, shouldValidate: true });
          const current = form.getValues(`addOns.${i}.unit`) ?? '';
          const next = unitAfterPick(ing, current);
          if (next !== current) form.setValue(`addOns.${i}.unit`, next, { shouldDirty: true });
        }}
      />
      <TextField label="Amount" error={err?.amountText?.message} {...form.register(`addOns.${i}.amountText`)} />
      <SelectField label="Unit" error={err?.unit?.message} {...form.register(`addOns.${i}.unit`)} value={unit}>
        {units.map((u) => (
          <option key={u.code} value={u.code}>
            {u.label}
          </option>
        ))}
      </SelectField>
      <TextField label="Note" error={err?.note?.message} {...form.register(`addOns.${i}.note`)} />
      <Button type="button" variant="ghost" onClick={onRemove} aria-label={`Remove add-on ${i + 1}`}>
        Remove
      </Button>
    </div>
  );
}

export function AssemblyForm({ initial, names = {}, trayNames = {}, busy, formError, onSubmit, onDirtyChange }: Props) {
  const form = useForm<AssemblyInput, unknown, AssemblyValues>({ resolver: zodResolver(createAssemblySchema), defaultValues: initial });
  const trays = useFieldArray({ control: form.control, name: 'trays' });
  const addOns = useFieldArray({ control: form.control, name: 'addOns' });
  const trayOptions = useQuery(trayOptionsQuery());
  const scale = useTempScale();
  const [steps, setSteps] = useState((initial.assemblySteps ?? []).join('\n'));
  const [reheat, setReheat] = useState((initial.reheatSteps ?? []).join('\n'));
  useReportDirty(
    form.formState.isDirty || steps !== (initial.assemblySteps ?? []).join('\n') || reheat !== (initial.reheatSteps ?? []).join('\n'),
    onDirtyChange,
  );
  const err = form.formState.errors;
  const watchedTrays = useWatch({ control: form.control, name: 'trays' });
  const watchedAddOns = useWatch({ control: form.control, name: 'addOns' });
  return (
    <form
      noValidate
      className="flex flex-col gap-4"
      onSubmit={(e) => {
        form.setValue('assemblySteps', linesToSteps(steps));
        form.setValue('reheatSteps', linesToSteps(reheat));
        return form.handleSubmit((v) => onSubmit(v, form.setError))(e);
      }}
    >
      <TextField label="Plate name" error={err.name?.message} {...form.register('name')} />
      <TextAreaField label="Description" rows={2} error={err.description?.message} {...form.register('description')} />

      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">Base tray portions</legend>
        {err.trays?.message && <Notice tone="block" title={err.trays.message} />}
        {trays.fields.map((f, i) => (
          <div key={f.id} className="grid items-end gap-2 sm:grid-cols-[2fr_1fr_auto]">
            {/* Controlled by the watched value: the tray shows once the options have loaded, not only if they came first. */}
            <SelectField
              label="Base tray"
              error={err.trays?.[i]?.trayId?.message}
              {...form.register(`trays.${i}.trayId`, { valueAsNumber: true })}
              value={Number.isFinite(Number(watchedTrays?.[i]?.trayId)) && Number(watchedTrays?.[i]?.trayId) > 0 ? String(watchedTrays?.[i]?.trayId) : ''}
            >
              <option value="">Choose…</option>
              {[
                ...(trayOptions.data ?? []),
                ...Object.entries(trayNames)
                  .filter(([id]) => !(trayOptions.data ?? []).some((t) => t.id === Number(id)))
                  .map(([id, name]) => ({ id: Number(id), name: `${name} (archived)` })),
              ].map((t) => (
                <option key={t.id} value={t.id}>
                  {t.name}
                </option>
              ))}
            </SelectField>
            <TextField label="Portions" inputMode="decimal" error={err.trays?.[i]?.portions?.message} {...form.register(`trays.${i}.portions`)} />
            <Button type="button" variant="ghost" onClick={() => trays.remove(i)} aria-label={`Remove tray line ${i + 1}`}>
              Remove
            </Button>
          </div>
        ))}
        <div>
          <Button type="button" variant="secondary" size="sm" onClick={() => trays.append({ trayId: 0, portions: 1 })}>
            Add a tray portion
          </Button>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">Add-ons</legend>
        {addOns.fields.map((f, i) => (
          <AddOnRow key={f.id} form={form} index={i} initialName={names[form.getValues(`addOns.${i}.ingredientId`) as number]} onRemove={() => addOns.remove(i)} />
        ))}
        <div>
          <Button type="button" variant="secondary" size="sm" onClick={() => addOns.append({ ingredientId: 0, amountText: '1', unit: 'g', note: '' })}>
            Add an add-on
          </Button>
        </div>
      </fieldset>

      <PlatePreview parts={previewParts({ trays: watchedTrays, addOns: watchedAddOns })} />

      <TextAreaField label="Assembly steps (one per line)" rows={3} value={steps} onChange={(e) => setSteps(e.target.value)} />
      <TextAreaField label="Reheat steps (one per line)" rows={3} value={reheat} onChange={(e) => setReheat(e.target.value)} hint={`Reheat until every part reaches ${bothScales(REHEAT_MIN_F, scale)}.`} />
      {formError && <Notice tone="block" title={formError} />}
      <div>
        <Button type="submit" busy={busy}>
          Save plate
        </Button>
      </div>
    </form>
  );
}
