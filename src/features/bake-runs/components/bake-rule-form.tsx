import { FormFooter, usePinnedRecord } from './form-footer';
import { useForm } from 'react-hook-form';
import { RACK_PREFERENCES, type BakeRuleDto } from '@shared/schemas/bake-setup.schema';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { useSaveBakeRule } from '../api/use-bake-run-mutations';
import type { TempUnit } from './temperature';
import { sentAsF, shownIn, type ScaleKind } from './scale-fields';

interface RuleForm {
  category: string;
  label: string;
  tempF: string;
  tempC: string;
  minMinutes: string;
  maxMinutes: string;
  handsOnMinutes: string;
  toleranceF: string;
  donenessCue: string;
  minInternalF: string;
  minInternalSource: string;
  rackPreference: string;
  convectionDeltaF: string;
  crowdingPct: string;
  note: string;
}

const str = (v: number | null | undefined) => (v == null ? '' : String(v));

/** The form's values for a bake rule (a new one's defaults), temperatures and differences in the page's unit. */
function ruleDefaults(rule: BakeRuleDto | null, unit: TempUnit): RuleForm {
  return {
    category: rule?.category ?? '',
    label: rule?.label ?? '',
    tempF: str(rule?.tempF),
    tempC: str(rule?.tempC),
    minMinutes: str(rule?.minMinutes),
    maxMinutes: str(rule?.maxMinutes),
    handsOnMinutes: str(rule?.handsOnMinutes ?? 10),
    toleranceF: shownIn(rule?.toleranceF ?? 10, 'delta', unit),
    donenessCue: rule?.donenessCue ?? '',
    minInternalF: shownIn(rule?.minInternalF, 'temp', unit),
    minInternalSource: rule?.minInternalSource ?? '',
    rackPreference: rule?.rackPreference ?? 'any',
    convectionDeltaF: shownIn(rule?.convectionDeltaF ?? 25, 'delta', unit),
    crowdingPct: str(rule?.crowdingPct ?? 10),
    note: rule?.note ?? '',
  };
}

/** Create or edit a bake rule (coach). Its temperatures and differences are typed in the page's unit (kept in °F). */
export function BakeRuleFormCard({ rule: opened, unit, onDone }: { rule: BakeRuleDto | null; unit: TempUnit; onDone: () => void }) {
  const save = useSaveBakeRule();
  const form = useForm<RuleForm>({ defaultValues: ruleDefaults(opened, unit) });
  const pinned = usePinnedRecord(opened, (theirs) => form.reset(ruleDefaults(theirs, unit)));
  const rule = pinned.base;
  const err = form.formState.errors;
  // Read while rendering, so react-hook-form tracks which fields were changed.
  const touched = form.formState.dirtyFields;
  const submitAt = (version = rule?.version) =>
    form.handleSubmit(async (v) => {
      // Typed in the page's scale; the rule keeps °F (a field left as it was keeps its stored value exactly).
      const asF = (name: 'toleranceF' | 'minInternalF' | 'convectionDeltaF', stored: number | null | undefined, kind: ScaleKind) =>
        sentAsF(v[name], stored, !!touched[name], kind, unit);
      const body = {
        label: v.label,
        // The set temperature in °C is whole degrees: left as it was, the stored °F goes back (400 °F, not 399.2 °F).
        ...(unit === 'C' ? (rule && !touched.tempC ? { tempF: rule.tempF } : { tempC: Number(v.tempC) }) : { tempF: Number(v.tempF) }),
        minMinutes: Number(v.minMinutes),
        maxMinutes: Number(v.maxMinutes),
        handsOnMinutes: Number(v.handsOnMinutes),
        toleranceF: asF('toleranceF', rule?.toleranceF ?? 10, 'delta') as number,
        donenessCue: v.donenessCue,
        minInternalF: asF('minInternalF', rule?.minInternalF, 'temp') as number | null,
        minInternalSource: v.minInternalSource.trim() === '' ? null : v.minInternalSource,
        rackPreference: v.rackPreference as BakeRuleDto['rackPreference'],
        convectionDeltaF: asF('convectionDeltaF', rule?.convectionDeltaF ?? 25, 'delta') as number,
        crowdingPct: Number(v.crowdingPct),
        note: v.note,
      };
      try {
        await save.mutateAsync(rule && version !== undefined ? { ...body, id: rule.id, version } : { ...body, category: v.category });
        onDone();
      } catch (e) {
        pinned.failed(e, form.setError);
      }
    });
  const submit = submitAt();
  return (
    <form onSubmit={submit} className="flex flex-col gap-3 rounded-tray border border-line bg-paper-card p-4" aria-label={rule ? `Edit ${rule.label}` : 'New bake rule'}>
      <div className="grid gap-3 sm:grid-cols-3">
        {!rule && <TextField label="Category code" placeholder="e.g. meatballs" {...form.register('category')} error={err.category?.message} />}
        <TextField label="Name" {...form.register('label')} error={err.label?.message} />
        {unit === 'C' ? (
          <TextField label="Set temperature (°C)" type="number" step="any" {...form.register('tempC')} error={err.tempC?.message ?? err.tempF?.message} />
        ) : (
          <TextField label="Set temperature (°F)" type="number" step="any" {...form.register('tempF')} error={err.tempF?.message} />
        )}
        <TextField label="Bake time from (min)" type="number" {...form.register('minMinutes')} error={err.minMinutes?.message} hint="One tray, uncrowded conventional oven" />
        <TextField label="Bake time to (min)" type="number" {...form.register('maxMinutes')} error={err.maxMinutes?.message} />
        <TextField label="Hands-on per tray (min)" type="number" {...form.register('handsOnMinutes')} error={err.handsOnMinutes?.message} />
        <TextField label={`Tolerance (± °${unit})`} type="number" step="any" {...form.register('toleranceF')} error={err.toleranceF?.message} />
        <TextField label={`Minimum internal (°${unit})`} type="number" step="any" {...form.register('minInternalF')} error={err.minInternalF?.message} hint="Blank when food safety names none" />
        <TextField label="Source of the minimum" {...form.register('minInternalSource')} error={err.minInternalSource?.message} hint="e.g. USDA FSIS Safe Minimum Internal Temperatures chart" />
        <SelectField label="Rack" {...form.register('rackPreference')} error={err.rackPreference?.message}>
          {RACK_PREFERENCES.map((r) => (
            <option key={r} value={r}>
              {r}
            </option>
          ))}
        </SelectField>
        <TextField label={`Convection: lower by (°${unit})`} type="number" step="any" {...form.register('convectionDeltaF')} error={err.convectionDeltaF?.message} hint={`Default ${shownIn(25, 'delta', unit)}`} />
        <TextField
          label="Crowding: + % time per extra tray"
          type="number"
          step="any"
          {...form.register('crowdingPct')}
          error={err.crowdingPct?.message}
          hint="Default 10 (common practice, no source)"
        />
      </div>
      <TextAreaField label="Doneness cue" rows={2} {...form.register('donenessCue')} error={err.donenessCue?.message} />
      <TextAreaField label="Note" rows={2} {...form.register('note')} error={err.note?.message} />
      <FormFooter saveLabel="Save rule" what="bake rule" pinned={pinned} saveOn={(v) => void submitAt(v)()} rootError={err.root?.message} busy={save.isPending} onCancel={onDone} />
    </form>
  );
}
