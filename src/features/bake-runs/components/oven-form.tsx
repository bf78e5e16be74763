import { FormFooter, usePinnedRecord } from './form-footer';
import { useForm } from 'react-hook-form';
import type { OvenDto } from '@shared/schemas/bake-setup.schema';
import { TextField } from '@/components/ui/field';
import { useSaveOven } from '../api/use-bake-run-mutations';
import type { TempUnit } from './temperature';
import { toCelsiusRounded } from '@shared/domain/temperature';
import { sentAsF, shownIn } from './scale-fields';

interface OvenForm {
  name: string;
  racks: number;
  traysPerRack: number;
  convection: boolean;
  heatFPerMin: string;
  coolFPerMin: string;
  maxF: number;
  maxC: number;
}

/** The form's values for an oven (a new one's defaults), rates and maximum in the page's unit. */
function ovenDefaults(oven: OvenDto | null, unit: TempUnit): OvenForm {
  return {
    ...(oven ?? { name: '', racks: 2, traysPerRack: 1, convection: false, maxF: 500, maxC: toCelsiusRounded(500) }),
    heatFPerMin: shownIn(oven?.heatFPerMin ?? 25, 'delta', unit),
    coolFPerMin: shownIn(oven?.coolFPerMin ?? 15, 'delta', unit),
  };
}

/** Create or edit an oven (coach). The maximum and the rates are typed in the page's unit (kept in °F). */
export function OvenFormCard({ oven: opened, unit, onDone }: { oven: OvenDto | null; unit: TempUnit; onDone: () => void }) {
  const save = useSaveOven();
  const form = useForm<OvenForm>({ defaultValues: ovenDefaults(opened, unit) });
  const pinned = usePinnedRecord(opened, (theirs) => form.reset(ovenDefaults(theirs, unit)));
  const oven = pinned.base;
  const err = form.formState.errors;
  // Read while rendering, so react-hook-form tracks which fields were changed.
  const touched = form.formState.dirtyFields;
  const submitAt = (version = oven?.version) =>
    form.handleSubmit(async (v) => {
      // Rates typed in the page's unit per minute; the oven keeps °F (a rate left as it was keeps its stored value).
      const body = {
        name: v.name,
        racks: Number(v.racks),
        traysPerRack: Number(v.traysPerRack),
        convection: v.convection,
        heatFPerMin: sentAsF(v.heatFPerMin, oven?.heatFPerMin ?? 25, !!touched.heatFPerMin, 'delta', unit) as number,
        coolFPerMin: sentAsF(v.coolFPerMin, oven?.coolFPerMin ?? 15, !!touched.coolFPerMin, 'delta', unit) as number,
        // The maximum in °C is whole degrees: left as it was, the stored °F goes back (475 °F is 246 °C, 474.8 °F again).
        ...(unit === 'C' ? (oven && !touched.maxC ? { maxF: oven.maxF } : { maxC: Number(v.maxC) }) : { maxF: Number(v.maxF) }),
      };
      try {
        await save.mutateAsync(oven ? { ...body, id: oven.id, version } : body);
        onDone();
      } catch (e) {
        pinned.failed(e, form.setError);
      }
    });
  const submit = submitAt();
  return (
    <form onSubmit={submit} className="flex flex-col gap-3 rounded-tray border border-line bg-paper-card p-4" aria-label={oven ? `Edit ${oven.name}` : 'New oven'}>
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Name" {...form.register('name')} error={err.name?.message} />
        <TextField label="Racks" type="number" min={1} max={12} {...form.register('racks')} error={err.racks?.message} />
        <TextField label="Trays per rack" type="number" min={1} max={6} {...form.register('traysPerRack')} error={err.traysPerRack?.message} />
        <TextField
          label={`Heating rate (°${unit} per minute)`}
          type="number"
          step="any"
          {...form.register('heatFPerMin')}
          error={err.heatFPerMin?.message}
          hint={`Default ${shownIn(25, 'delta', unit)} (common practice, no source)`}
        />
        <TextField
          label={`Cooling rate, door ajar (°${unit} per minute)`}
          type="number"
          step="any"
          {...form.register('coolFPerMin')}
          error={err.coolFPerMin?.message}
          hint={`Default ${shownIn(15, 'delta', unit)} (common practice, no source)`}
        />
        {unit === 'C' ? (
          <TextField label="Maximum (°C)" type="number" step="any" {...form.register('maxC')} error={err.maxC?.message ?? err.maxF?.message} />
        ) : (
          <TextField label="Maximum (°F)" type="number" step="any" {...form.register('maxF')} error={err.maxF?.message} />
        )}
      </div>
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" className="h-5 w-5" {...form.register('convection')} /> Convection (fan) oven
      </label>
      <FormFooter saveLabel="Save oven" what="oven" pinned={pinned} saveOn={(v) => void submitAt(v)()} rootError={err.root?.message} busy={save.isPending} onCancel={onDone} />
    </form>
  );
}
