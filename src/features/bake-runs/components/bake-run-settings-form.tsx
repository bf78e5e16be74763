import { useState } from 'react';
import type { BakeRunSettingsInput, OvenDto, WeekBakeRunDto } from '@shared/schemas/bake-setup.schema';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { OvenChecks } from './oven-checks';
import { isApiError } from '@/lib/problem';

interface Props {
  dto: WeekBakeRunDto;
  allOvens: OvenDto[];
  saving: boolean;
  error: unknown;
  onSave: (body: BakeRunSettingsInput) => void;
  onReload: () => void;
}

interface Fields {
  start: string;
  cooks: string;
  ovenIds: number[];
  handsOn: Record<string, string>;
}

/** The form's fields as the saved settings give them (every oven when none is chosen). */
function fieldsOf(dto: WeekBakeRunDto, allOvens: OvenDto[]): Fields {
  const s = dto.settings;
  return {
    start: s.start,
    cooks: String(s.cooks),
    ovenIds: s.ovenIds.length ? s.ovenIds : allOvens.map((o) => o.id),
    handsOn: Object.fromEntries(dto.trays.map((t) => [String(t.trayId), String(t.handsOnMinutes)])),
  };
}

const sameFields = (a: Fields, b: Fields) =>
  a.start === b.start &&
  a.cooks === b.cooks &&
  [...a.ovenIds].sort().join() === [...b.ovenIds].sort().join() &&
  JSON.stringify(Object.entries(a.handsOn).sort()) === JSON.stringify(Object.entries(b.handsOn).sort());

/**
 * The coach's settings of a week's run: start, cooks, ovens, hands-on minutes per base tray. When someone else's
 * change arrives (the assistant moved the start on prep day; another tab saved), untouched fields follow it; edits in
 * progress are kept, with a notice, and saving them is a stale edit (409) until their version is loaded.
 */
export function BakeRunSettingsForm({ dto, allOvens, saving, error, onSave, onReload }: Props) {
  const [loaded, setLoaded] = useState(() => ({ version: dto.settings.version, fields: fieldsOf(dto, allOvens) }));
  const [fields, setFields] = useState(loaded.fields);
  /** What the last "Save and plan" sent and the newest version known then, until its answer is taken in. */
  const [submitted, setSubmitted] = useState<{ fields: Fields; seen: number | null } | null>(null);
  const dirty = !sameFields(fields, loaded.fields);
  const newer = dto.settings.version !== loaded.version;
  // A version that arrived after the save, with no error, is the save's answer (the form still holds what it sent).
  const ownSave = submitted !== null && !error && dto.settings.version !== submitted.seen && sameFields(fields, submitted.fields);
  if (newer && (!dirty || ownSave)) {
    // Nothing typed yet, or this form's own save came back: follow the saved settings (state adjusted while
    // rendering, as React documents for state derived from props).
    const next = { version: dto.settings.version, fields: fieldsOf(dto, allOvens) };
    setLoaded(next);
    setFields(next.fields);
    setSubmitted(null);
  }
  const loadSaved = () => {
    const next = { version: dto.settings.version, fields: fieldsOf(dto, allOvens) };
    setLoaded(next);
    setFields(next.fields);
    onReload();
  };
  const { start, cooks, ovenIds, handsOn } = fields;
  const set = <K extends keyof Fields>(k: K, v: Fields[K] | ((old: Fields[K]) => Fields[K])) =>
    setFields((f) => ({ ...f, [k]: typeof v === 'function' ? (v as (old: Fields[K]) => Fields[K])(f[k]) : v }));
  const fieldErrors = isApiError(error, 400) ? error.fieldErrors : {};
  const stale = isApiError(error, 409) || (newer && dirty);
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    setSubmitted({ fields, seen: dto.settings.version });
    onSave({
      prepDate: dto.prepDate,
      start,
      cooks: Number(cooks),
      ovenIds: ovenIds.length === allOvens.length ? [] : ovenIds,
      handsOnMinutes: Object.fromEntries(Object.entries(handsOn).map(([k, v]) => [k, Number(v)])),
      // The version these edits started from: a change saved meanwhile makes this a 409, never a silent overwrite.
      ...(loaded.version === null ? {} : { version: loaded.version }),
    });
  };
  return (
    <form onSubmit={submit} className="no-print flex flex-col gap-4 rounded-tray bg-paper-card p-4 shadow-tray" aria-label="Bake run settings">
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Start" type="datetime-local" value={start} onChange={(e) => set('start', e.target.value)} error={fieldErrors.start?.[0]} required />
        <TextField label="Cooks" type="number" min={1} max={50} value={cooks} onChange={(e) => set('cooks', e.target.value)} error={fieldErrors.cooks?.[0]} required />
      </div>
      <OvenChecks legend="Ovens" ovens={allOvens} chosen={ovenIds} onChange={(ids) => set('ovenIds', ids)} error={fieldErrors.ovenIds?.[0]} />
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
              onChange={(e) => set('handsOn', (h) => ({ ...h, [String(t.trayId)]: e.target.value }))}
              error={fieldErrors[`handsOnMinutes.${t.trayId}`]?.[0]}
            />
          ))}
        </fieldset>
      )}
      {stale && (
        <Notice tone="warn" title="These settings were changed meanwhile">
          <p className="mb-2 text-sm">
            The run was changed since you began here (on prep day its start, ovens or cooks are changed from Now and next). Your
            changes are still here; loading the saved settings replaces them.
          </p>
          <Button type="button" variant="secondary" size="sm" onClick={loadSaved}>
            Load the saved settings
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
