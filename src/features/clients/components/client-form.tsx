import { useMemo, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { MAJOR_ALLERGENS } from '@shared/domain/allergens';
import { computeTargets, type ActivityLevel, type Goal, type Sex } from '@shared/domain/targets';
import {
  ACTIVITY_LABELS,
  ACTIVITY_LEVELS,
  CLIENT_DEFAULTS,
  GOAL_LABELS,
  GOALS,
  createClientSchema,
  type ClientDto,
  type CreateClientData,
  type CreateClientInput,
} from '@shared/schemas/clients.schema';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { useReportDirty } from '@/lib/use-edit-base';
import { cmOf, feetInches, kgOf, perLb, poundsOf } from '@shared/domain/body-measures';
import { decimalCommaToPoint } from '@shared/domain/units';

export const emptyClient: CreateClientInput = {
  name: '',
  email: '',
  householdMultiplier: CLIENT_DEFAULTS.householdMultiplier,
  sex: 'female',
  ageYears: 40,
  heightCm: '165',
  weightKg: '70',
  activity: 'light',
  goal: 'maintain',
  goalAdjustment: null,
  netCarbCapG: CLIENT_DEFAULTS.netCarbCapG,
  proteinGPerKg: CLIENT_DEFAULTS.proteinGPerKg,
  targetMode: 'computed',
  manualTargets: null,
  slotShares: {},
  allergens: [],
  dislikes: [],
  healthNotes: '',
};

export function clientToInput(c: ClientDto): CreateClientInput {
  return {
    name: c.name,
    email: c.email ?? '',
    householdMultiplier: c.householdMultiplier,
    sex: c.sex,
    ageYears: c.ageYears,
    heightCm: c.heightCm,
    weightKg: c.weightKg,
    activity: c.activity,
    goal: c.goal,
    goalAdjustment: c.goalAdjustment,
    netCarbCapG: c.netCarbCapG,
    proteinGPerKg: c.proteinGPerKg,
    targetMode: c.targetMode,
    manualTargets: c.manualTargets,
    slotShares: c.slotShares,
    allergens: c.allergens,
    dislikes: c.dislikes,
    healthNotes: c.healthNotes,
  };
}

/** A number field's text as the schema reads it (a decimal comma as a point; '' when ambiguous). */
const asTyped = (v: unknown) => decimalCommaToPoint(String(v ?? '').trim()) ?? '';

/** Live preview of the computed targets with the shared Mifflin–St Jeor code (the server computes the same). */
function TargetsPreview({ values }: { values: Partial<CreateClientInput> }) {
  const preview = useMemo(() => {
    try {
      return computeTargets({
        sex: values.sex as Sex,
        weightKg: asTyped(values.weightKg),
        heightCm: asTyped(values.heightCm),
        ageYears: Number(values.ageYears),
        activity: values.activity as ActivityLevel,
        goal: values.goal as Goal,
        netCarbCapG: asTyped(values.netCarbCapG ?? '20'),
        proteinGPerKg: asTyped(values.proteinGPerKg ?? '1.5'),
        goalAdjustment: values.goalAdjustment ?? undefined,
      });
    } catch {
      return null;
    }
  }, [values.sex, values.weightKg, values.heightCm, values.ageYears, values.activity, values.goal, values.netCarbCapG, values.proteinGPerKg, values.goalAdjustment]);
  if (!preview) return <Notice tone="info" title="Enter weight, height and age to see the targets" />;
  return (
    <div className="flex flex-col gap-2" aria-live="polite">
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        {[
          ['Energy', `${preview.targetKcal} kcal`],
          ['Net-carb cap', `${preview.netCarbCapG} g`],
          ['Protein', `${preview.proteinG} g`],
          ['Fat', `${preview.fatG} g`],
        ].map(([k, v]) => (
          <div key={k} className="rounded-lg bg-paper p-2">
            <dt className="text-xs text-ink-faint">{k}</dt>
            <dd className="num text-lg font-bold">{v}</dd>
          </div>
        ))}
      </dl>
      <p className="text-xs text-ink-faint">
        Resting energy <span className="num">{preview.reeKcal}</span> kcal by the Mifflin–St Jeor equation (Am J Clin Nutr
        1990), × activity = <span className="num">{preview.tdeeKcal}</span> kcal; fat fills the rest after protein and net carbs.
      </p>
      {preview.notes.map((n) => (
        <Notice key={n.code} tone="warn" title={n.message} />
      ))}
    </div>
  );
}

/**
 * Height in feet and inches and weight in pounds for a coach who works in US measures; the profile keeps
 * centimetres and kilograms (what the Mifflin–St Jeor equation takes), shown beside the fields.
 */
function UsBodyFields(props: {
  heightCm: string;
  weightKg: string;
  errors: { height?: string; weight?: string };
  onHeightCm: (cm: string) => void;
  onWeightKg: (kg: string) => void;
}) {
  const start = feetInches(props.heightCm);
  const [ft, setFt] = useState(start.ft);
  const [inches, setInches] = useState(start.in);
  const [lb, setLb] = useState(poundsOf(props.weightKg));
  return (
    <>
      <div className="grid grid-cols-2 gap-2">
        <TextField
          label="Height (ft)"
          inputMode="numeric"
          value={ft}
          error={props.errors.height}
          hint={props.heightCm ? `= ${props.heightCm} cm` : undefined}
          onChange={(e) => {
            setFt(e.target.value);
            props.onHeightCm(cmOf(e.target.value, inches));
          }}
        />
        <TextField
          label="Height (in)"
          inputMode="decimal"
          value={inches}
          onChange={(e) => {
            setInches(e.target.value);
            props.onHeightCm(cmOf(ft, e.target.value));
          }}
        />
      </div>
      <TextField
        label="Weight (lb)"
        inputMode="decimal"
        value={lb}
        error={props.errors.weight}
        hint={props.weightKg ? `= ${props.weightKg} kg` : undefined}
        onChange={(e) => {
          setLb(e.target.value);
          props.onWeightKg(kgOf(e.target.value));
        }}
      />
    </>
  );
}

interface Props {
  initial: CreateClientInput;
  slots?: string[];
  busy?: boolean;
  submitLabel: string;
  formError?: string | null;
  /** The coach's measures: height and weight are typed in feet, inches and pounds (US) or centimetres and kilograms. */
  unitSystem: 'us' | 'metric';
  onSubmit: (values: CreateClientData, setError: ReturnType<typeof useForm<CreateClientInput, unknown, CreateClientData>>['setError']) => void;
  /** Told whether the form holds unsaved typing. */
  onDirtyChange?: (dirty: boolean) => void;
}

export function ClientForm({ initial, slots = [], busy, submitLabel, formError, unitSystem, onSubmit, onDirtyChange }: Props) {
  const form = useForm<CreateClientInput, unknown, CreateClientData>({ resolver: zodResolver(createClientSchema), defaultValues: initial });
  useReportDirty(form.formState.isDirty, onDirtyChange);
  const { register, formState, control } = form;
  const values = useWatch({ control }) as Partial<CreateClientInput>;
  const err = formState.errors;
  const manual = values.targetMode === 'manual';
  return (
    <form noValidate onSubmit={form.handleSubmit((v) => onSubmit(v, form.setError))} className="flex flex-col gap-5">
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-bold">Who</legend>
        <TextField label="Name" error={err.name?.message} {...register('name')} />
        <TextField label="E-mail (for the invitation)" type="email" error={err.email?.message} {...register('email')} />
        <TextField
          label="Portions per plate (household)"
          inputMode="decimal"
          hint="2 = the plate feeds two people"
          error={err.householdMultiplier?.message}
          {...register('householdMultiplier')}
        />
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-lg font-bold">Body and activity</legend>
        <SelectField label="Equation form (sex)" error={err.sex?.message} {...register('sex')}>
          <option value="female">Female</option>
          <option value="male">Male</option>
        </SelectField>
        <TextField label="Age (years)" inputMode="numeric" error={err.ageYears?.message} {...register('ageYears', { valueAsNumber: true })} />
        {unitSystem === 'us' ? (
          <UsBodyFields
            heightCm={String(values.heightCm ?? '')}
            weightKg={String(values.weightKg ?? '')}
            errors={{ height: err.heightCm?.message, weight: err.weightKg?.message }}
            onHeightCm={(v) => form.setValue('heightCm', v, { shouldDirty: true, shouldValidate: formState.isSubmitted })}
            onWeightKg={(v) => form.setValue('weightKg', v, { shouldDirty: true, shouldValidate: formState.isSubmitted })}
          />
        ) : (
          <>
            <TextField label="Height (cm)" inputMode="decimal" error={err.heightCm?.message} {...register('heightCm')} />
            <TextField label="Weight (kg)" inputMode="decimal" error={err.weightKg?.message} {...register('weightKg')} />
          </>
        )}
        <SelectField label="Activity" error={err.activity?.message} {...register('activity')}>
          {ACTIVITY_LEVELS.map((a) => (
            <option key={a} value={a}>
              {ACTIVITY_LABELS[a]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Goal" error={err.goal?.message} {...register('goal')}>
          {GOALS.map((g) => (
            <option key={g} value={g}>
              {GOAL_LABELS[g]}
            </option>
          ))}
        </SelectField>
      </fieldset>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-bold">Daily targets</legend>
        <SelectField label="Targets" error={err.targetMode?.message} {...register('targetMode')}>
          <option value="computed">Computed (Mifflin–St Jeor × activity, keto split)</option>
          <option value="manual">Typed by hand</option>
        </SelectField>
        {manual ? (
          <div className="grid gap-4 sm:grid-cols-4">
            <TextField label="Energy (kcal)" inputMode="numeric" error={err.manualTargets?.targetKcal?.message ?? err.manualTargets?.message} {...register('manualTargets.targetKcal', { valueAsNumber: true })} />
            <TextField label="Net-carb cap (g)" inputMode="decimal" error={err.manualTargets?.netCarbCapG?.message} {...register('manualTargets.netCarbCapG', { valueAsNumber: true })} />
            <TextField label="Protein (g)" inputMode="decimal" error={err.manualTargets?.proteinG?.message} {...register('manualTargets.proteinG', { valueAsNumber: true })} />
            <TextField label="Fat (g)" inputMode="decimal" error={err.manualTargets?.fatG?.message} {...register('manualTargets.fatG', { valueAsNumber: true })} />
          </div>
        ) : (
          <>
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField label="Net-carb cap (g per day)" inputMode="decimal" hint="20 g is the strict keto start" error={err.netCarbCapG?.message} {...register('netCarbCapG')} />
              <TextField label="Protein (g per kg)" inputMode="decimal" hint={`Usual keto range 1.2–2.0${unitSystem === 'us' && perLb(values.proteinGPerKg) ? ` · = ${perLb(values.proteinGPerKg)} g per lb of body weight` : ''}`} error={err.proteinGPerKg?.message} {...register('proteinGPerKg')} />
            </div>
            <TargetsPreview values={values} />
          </>
        )}
        {slots.length > 0 && (
          <div className="grid gap-4 sm:grid-cols-3">
            {slots.map((slot) => (
              <TextField
                key={slot}
                label={`Share of the day: ${slot}`}
                inputMode="decimal"
                hint="0.3 = 30 %"
                error={(err.slotShares as Record<string, { message?: string }> | undefined)?.[slot]?.message ?? (err.slotShares as { message?: string } | undefined)?.message}
                {...register(`slotShares.${slot}` as const, { setValueAs: (v) => (v === '' || v === undefined ? undefined : Number(v)) })}
              />
            ))}
          </div>
        )}
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-bold">Allergens and dislikes</legend>
        <Controller
          control={control}
          name="allergens"
          render={({ field }) => (
            <div className="flex flex-wrap gap-2" role="group" aria-label="Allergens">
              {MAJOR_ALLERGENS.map((a) => {
                const on = (field.value ?? []).includes(a.code);
                return (
                  <label key={a.code} className={`flex min-h-11 items-center gap-2 rounded-lg border px-3 ${on ? 'border-signal bg-signal-50' : 'border-line-strong'}`}>
                    <input
                      type="checkbox"
                      checked={on}
                      onChange={(e) => field.onChange(e.target.checked ? [...(field.value ?? []), a.code] : (field.value ?? []).filter((x) => x !== a.code))}
                    />
                    {a.label}
                  </label>
                );
              })}
            </div>
          )}
        />
        <Controller
          control={control}
          name="dislikes"
          render={({ field }) => (
            <TextField
              label="Dislikes"
              hint={'Separated by commas. The board flags a plate when an ingredient, base tray or tag has every word of a dislike ("red onion" finds "Onions, red, raw"); a word of five letters or more also finds words ending with it ("berries" finds "Blackberries").'}
              defaultValue={(field.value ?? []).join(', ')}
              onBlur={(e) => field.onChange(e.target.value.split(',').map((s) => s.trim()).filter(Boolean))}
            />
          )}
        />
      </fieldset>

      <TextAreaField label="Health notes (coach only)" rows={3} error={err.healthNotes?.message} {...register('healthNotes')} />
      {formError && <Notice tone="block" title={formError} />}
      <div>
        <Button type="submit" busy={busy}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
