import { useState } from 'react';
import { STANDARD_PANS, STANDARD_PAN_CODES } from '@shared/domain/scaling';
import type { ScaleTrayInput, TrayDto } from '@shared/schemas/trays.schema';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Card, Notice } from '@/components/ui/states';
import { reasonOf } from '@/lib/problem';
import { useScaleTray } from '../api/use-tray-mutations';
import { counted } from '@/lib/words';

type Mode = 'targetPortions' | 'factor' | 'pan';

/** Scale a tray: to a portion count in whole trays, by a factor, or to another pan by area. Nothing is saved. */
export function ScalePanel({ tray, system }: { tray: TrayDto; system: 'us' | 'metric' }) {
  const scale = useScaleTray(tray.id);
  const [mode, setMode] = useState<Mode>('targetPortions');
  const [value, setValue] = useState('40');
  const [pan, setPan] = useState<string>('full-sheet');
  const [metric, setMetric] = useState(system === 'metric');

  const run = () => {
    const sys = metric ? 'metric' : 'us';
    const body: ScaleTrayInput =
      mode === 'pan' ? { pan: { code: pan as 'full-sheet' }, system: sys } : mode === 'factor' ? { factor: value, system: sys } : { targetPortions: value, system: sys };
    scale.mutate(body);
  };
  const r = scale.data;
  const fieldError = (scale.error as { fieldErrors?: Record<string, string[]> } | null)?.fieldErrors;
  return (
    <Card className="no-print">
      <h2 className="mb-3 text-xl">Scale</h2>
      <form
        className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end"
        onSubmit={(e) => {
          e.preventDefault();
          run();
        }}
      >
        <SelectField label="Scale by" value={mode} onChange={(e) => setMode(e.target.value as Mode)}>
          <option value="targetPortions">Portions needed (whole trays)</option>
          <option value="factor">A factor</option>
          <option value="pan">Another pan (same depth)</option>
        </SelectField>
        {mode === 'pan' ? (
          <SelectField label="New pan" value={pan} onChange={(e) => setPan(e.target.value)}>
            {STANDARD_PAN_CODES.map((c) => (
              <option key={c} value={c}>
                {STANDARD_PANS[c].label}
              </option>
            ))}
          </SelectField>
        ) : (
          <TextField
            label={mode === 'factor' ? 'Factor' : 'Portions needed'}
            inputMode="decimal"
            value={value}
            error={fieldError?.factor?.[0] ?? fieldError?.targetPortions?.[0]}
            onChange={(e) => setValue(e.target.value)}
          />
        )}
        <Button type="submit" busy={scale.isPending}>
          Scale
        </Button>
        <label className="flex min-h-11 items-center gap-2 sm:col-span-3">
          <input type="checkbox" checked={metric} onChange={(e) => setMetric(e.target.checked)} /> Show metric amounts
        </label>
      </form>
      {/* Any refusal the amount box does not show (another pan, an error of another field) is said here. */}
      {scale.isError && (mode === 'pan' || !(fieldError?.factor || fieldError?.targetPortions)) && <Notice tone="block" title={reasonOf(scale.error)} />}
      {r && (
        <div className="mt-4" aria-live="polite">
          <p className="num mb-2 font-bold">
            {r.mode === 'targetPortions' &&
              `${counted(r.trays ?? 0, 'tray')} · ${counted(r.portionsBaked ?? 0, 'portion')} baked · ${r.spare} spare`}
            {r.mode === 'factor' && `× ${r.factor}`}
            {r.mode === 'pan' && `${r.pan?.label}: × ${r.factor} by area · ${r.portionsAtSameSize} portions of the same size`}
          </p>
          <table className="num w-full text-left">
            <thead>
              <tr className="border-b border-line text-sm text-ink-faint">
                <th className="py-1">Ingredient</th>
                <th>Recipe</th>
                <th>Scaled</th>
              </tr>
            </thead>
            <tbody>
              {r.lines.map((l, i) => (
                <tr key={i} className="border-b border-line">
                  <td className="py-1">{l.ingredientName}</td>
                  <td className="text-ink-soft">{l.originalText}</td>
                  <td className="font-bold">
                    {l.display}
                    {l.grams !== null && <span className="ml-2 text-sm font-normal text-ink-faint">({l.grams} g)</span>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-xs text-ink-faint">{r.roundingNote}</p>
        </div>
      )}
    </Card>
  );
}
