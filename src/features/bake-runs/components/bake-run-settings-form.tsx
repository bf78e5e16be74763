import { useState } from 'react';
import type { BakeRunSettingsInput, OvenDto, WeekBakeRunDto } from '@shared/schemas/bake-setup.schema';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { isApiError } from '@/lib/problem';

interface Props {
  dto: WeekBakeRunDto;
  allOvens: OvenDto[];
  saving: boolean;
  error: unknown;
  onSave: (body: BakeRunSettingsInput) => void;
  onReload: () => void;
}

/** The coach's settings of a week's run: start, cooks, ovens, hands-on minutes per base tray. */
export function BakeRunSettingsForm({ dto, allOvens, saving, error, onSave, onReload }: Props) {
  const s = dto.settings;
  const [start, setStart] = useState(s.start);
  const [cooks, setCooks] = useState(String(s.cooks));
  const [ovenIds, setOvenIds] = useState<number[]>(s.ovenIds.length ? s.ovenIds : allOvens.map((o) => o.id));
  const [handsOn, setHandsOn] = useState<Record<string, string>>(
    Object.fromEntries(dto.trays.map((t) => [String(t.trayId), String(t.handsOnMinutes)])),
  );
  const fieldErrors = isApiError(error, 400) ? error.fieldErrors : {};
  const stale = isApiError(error, 409);
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    onSave({
      prepDate: dto.prepDate,
      start,
      cooks: Number(cooks),
      ovenIds: ovenIds.length === allOvens.length ? [] : ovenIds,
      handsOnMinutes: Object.fromEntries(Object.entries(handsOn).map(([k, v]) => [k, Number(v)])),
      ...(s.version === null ? {} : { version: s.version }),
    });
  };
  return (
    <form onSubmit={submit} className="no-print flex flex-col gap-4 rounded-tray bg-paper-card p-4 shadow-tray" aria-label="Bake run settings">
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Start" type="datetime-local" value={start} onChange={(e) => setStart(e.target.value)} error={fieldErrors.start?.[0]} required />
        <TextField label="Cooks" type="number" min={1} max={50} value={cooks} onChange={(e) => setCooks(e.target.value)} error={fieldErrors.cooks?.[0]} required />
      </div>
      <fieldset className="flex flex-col gap-2">
        <legend className="text-sm font-bold">Ovens</legend>
        <div className="flex flex-wrap gap-4">
          {allOvens.map((o) => (
            <label key={o.id} className="flex min-h-11 items-center gap-2">
              <input
                type="checkbox"
                className="h-5 w-5"
                checked={ovenIds.includes(o.id)}
                onChange={(e) => setOvenIds((ids) => (e.target.checked ? [...ids, o.id] : ids.filter((i) => i !== o.id)))}
              />
              {o.name}
            </label>
          ))}
        </div>
        {fieldErrors.ovenIds && <p className="text-sm font-bold text-signal">⚠ {fieldErrors.ovenIds[0]}</p>}
      </fieldset>
      {dto.trays.length > 0 && (
        <fieldset className="grid gap-3 sm:grid-cols-3">
          <legend className="mb-1 text-sm font-bold">Hands-on minutes per tray (mixing, lining)</legend>
          {dto.trays.map((t) => (
            <TextField
              key={t.trayId}
              label={`${t.name} (× ${t.trayCount})`}
              type="number"
              min={0}
              max={600}
              value={handsOn[String(t.trayId)] ?? ''}
              onChange={(e) => setHandsOn((h) => ({ ...h, [String(t.trayId)]: e.target.value }))}
              error={fieldErrors[`handsOnMinutes.${t.trayId}`]?.[0]}
            />
          ))}
        </fieldset>
      )}
      {stale && (
        <Notice tone="warn" title="Someone else changed these settings">
          <Button type="button" variant="secondary" size="sm" onClick={onReload}>
            Load their version
          </Button>
        </Notice>
      )}
      {error && !stale && !isApiError(error, 400) ? <Notice tone="block" title="Not saved">{String((error as Error).message)}</Notice> : null}
      <div>
        <Button type="submit" busy={saving}>
          Save and plan
        </Button>
      </div>
    </form>
  );
}
