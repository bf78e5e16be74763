import { useState } from 'react';
import { useFieldArray, useForm, type UseFormSetError } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { createAssemblySchema, type AssemblyDto, type AssemblyInput, type AssemblyValues } from '@shared/schemas/assemblies.schema';
import { ingredientOptionsQuery, trayOptionsQuery } from '../api/assemblies.queries';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { PlatePreview, previewParts } from './plate-preview';

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

/** Picks an ingredient by searching the library. */
function IngredientPicker({ label, value, initialName, onPick, error }: { label: string; value?: number; initialName?: string; onPick: (id: number, name: string) => void; error?: string }) {
  const [q, setQ] = useState(initialName ?? '');
  const [open, setOpen] = useState(false);
  const results = useQuery(ingredientOptionsQuery(q));
  return (
    <div className="relative">
      <TextField
        label={label}
        value={q}
        error={error}
        hint={value ? undefined : 'Type to search the library'}
        onChange={(e) => {
          setQ(e.target.value);
          setOpen(true);
        }}
        role="combobox"
        aria-expanded={open}
        aria-autocomplete="list"
      />
      {open && results.data && results.data.length > 0 && (
        <ul role="listbox" className="absolute z-20 mt-1 max-h-60 w-full overflow-auto rounded-lg border border-line-strong bg-paper-card shadow-tray">
          {results.data.map((r) => (
            <li key={r.id} role="option" aria-selected={r.id === value}>
              <button
                type="button"
                className="w-full px-3 py-2 text-left hover:bg-paper-deep focus:bg-paper-deep"
                onClick={() => {
                  onPick(r.id, r.name);
                  setQ(r.name);
                  setOpen(false);
                }}
              >
                {r.name}
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

const linesToSteps = (t: string) => t.split('\n').map((s) => s.trim()).filter(Boolean);

interface Props {
  initial: AssemblyInput;
  names?: Record<number, string>;
  busy?: boolean;
  formError?: string | null;
  onSubmit: (v: AssemblyValues, setError: UseFormSetError<AssemblyInput>) => void;
}

export function AssemblyForm({ initial, names = {}, busy, formError, onSubmit }: Props) {
  const form = useForm<AssemblyInput, unknown, AssemblyValues>({ resolver: zodResolver(createAssemblySchema), defaultValues: initial });
  const trays = useFieldArray({ control: form.control, name: 'trays' });
  const addOns = useFieldArray({ control: form.control, name: 'addOns' });
  const trayOptions = useQuery(trayOptionsQuery());
  const [steps, setSteps] = useState((initial.assemblySteps ?? []).join('\n'));
  const [reheat, setReheat] = useState((initial.reheatSteps ?? []).join('\n'));
  const err = form.formState.errors;
  const watchedTrays = form.watch('trays');
  const watchedAddOns = form.watch('addOns');
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
            <SelectField label="Base tray" error={err.trays?.[i]?.trayId?.message} {...form.register(`trays.${i}.trayId`, { valueAsNumber: true })}>
              <option value="">Choose…</option>
              {(trayOptions.data ?? []).map((t) => (
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
          <div key={f.id} className="grid items-end gap-2 sm:grid-cols-[2fr_1fr_1fr_1fr_auto]">
            <IngredientPicker
              label="Ingredient"
              value={form.getValues(`addOns.${i}.ingredientId`) as number | undefined}
              initialName={names[form.getValues(`addOns.${i}.ingredientId`) as number]}
              error={err.addOns?.[i]?.ingredientId?.message}
              onPick={(id) => form.setValue(`addOns.${i}.ingredientId`, id, { shouldValidate: true })}
            />
            <TextField label="Amount" error={err.addOns?.[i]?.amountText?.message} {...form.register(`addOns.${i}.amountText`)} />
            <TextField label="Unit" hint="g, Tbsp, cup, slice…" error={err.addOns?.[i]?.unit?.message} {...form.register(`addOns.${i}.unit`)} />
            <TextField label="Note" error={err.addOns?.[i]?.note?.message} {...form.register(`addOns.${i}.note`)} />
            <Button type="button" variant="ghost" onClick={() => addOns.remove(i)} aria-label={`Remove add-on ${i + 1}`}>
              Remove
            </Button>
          </div>
        ))}
        <div>
          <Button type="button" variant="secondary" size="sm" onClick={() => addOns.append({ ingredientId: 0, amountText: '1', unit: 'Tbsp', note: '' })}>
            Add an add-on
          </Button>
        </div>
      </fieldset>

      <PlatePreview parts={previewParts({ trays: watchedTrays, addOns: watchedAddOns })} />

      <TextAreaField label="Assembly steps (one per line)" rows={3} value={steps} onChange={(e) => setSteps(e.target.value)} />
      <TextAreaField label="Reheat steps (one per line)" rows={3} value={reheat} onChange={(e) => setReheat(e.target.value)} hint="Reheat until every part reaches 165 °F (74 °C)." />
      {formError && <Notice tone="block" title={formError} />}
      <div>
        <Button type="submit" busy={busy}>
          Save plate
        </Button>
      </div>
    </form>
  );
}
