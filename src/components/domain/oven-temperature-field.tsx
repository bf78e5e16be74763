import { useState } from 'react';
import { toCelsiusRounded, toFahrenheitRounded, type TempScale } from '@shared/domain/temperature';
import { TextField } from '@/components/ui/field';

/** Whole °F limits of an oven set point (the tray schema's, shared/schemas/trays.schema.ts). */
export interface OvenLimitsF {
  min: number;
  max: number;
}

/** The °C text shown for a value the form holds in °F (a number, or text not yet a number). */
function celsiusText(valueF: unknown): string {
  const n = typeof valueF === 'number' ? valueF : typeof valueF === 'string' && valueF.trim() !== '' ? Number(valueF) : NaN;
  return Number.isFinite(n) ? String(toCelsiusRounded(n)) : typeof valueF === 'string' ? valueF : '';
}

/**
 * An oven set point the form keeps in whole °F, typed in the reader's scale: in °F as it is; in °C converted to the
 * nearest whole °F as it is typed (°F = °C × 9/5 + 32, NIST SP 811), with its errors in °C. The °F value is what the
 * server stores and the bake run reads.
 */
export function OvenTemperatureField({
  scale,
  valueF,
  onChangeF,
  onBlur,
  error,
  limitsF,
  name,
}: {
  scale: TempScale;
  valueF: unknown;
  onChangeF: (next: number | string) => void;
  onBlur?: () => void;
  /** The form's error (in °F terms); shown as is in °F. */
  error?: string;
  limitsF: OvenLimitsF;
  name?: string;
}) {
  const [text, setText] = useState(() => celsiusText(valueF));
  const [seen, setSeen] = useState(valueF);
  // A value set from outside (a bake category chosen, the form reset) shows in °C too; what was typed stays as typed.
  if (valueF !== seen) {
    setSeen(valueF);
    const typed = text.trim() === '' ? NaN : Number(text);
    const fromText = Number.isFinite(typed) ? toFahrenheitRounded(typed) === Number(valueF) : valueF === text;
    if (!fromText) setText(celsiusText(valueF));
  }

  if (scale === 'F') {
    return (
      <TextField
        label="Oven temperature (°F)"
        inputMode="numeric"
        name={name}
        value={valueF == null ? '' : String(valueF)}
        onChange={(e) => onChangeF(e.target.value)}
        onBlur={onBlur}
        error={error}
      />
    );
  }
  const typed = text.trim() === '' ? NaN : Number(text);
  const minC = toCelsiusRounded(limitsF.min);
  const maxC = toCelsiusRounded(limitsF.max);
  const own =
    text.trim() === ''
      ? undefined
      : !Number.isInteger(typed)
        ? 'Use whole degrees'
        : toFahrenheitRounded(typed) < limitsF.min
          ? `At least ${minC} °C`
          : toFahrenheitRounded(typed) > limitsF.max
            ? `At most ${maxC} °C`
            : undefined;
  return (
    <TextField
      label="Oven temperature (°C)"
      inputMode="numeric"
      name={name}
      value={text}
      onChange={(e) => {
        const next = e.target.value;
        setText(next);
        const n = next.trim() === '' ? NaN : Number(next);
        onChangeF(Number.isFinite(n) ? toFahrenheitRounded(n) : next);
      }}
      onBlur={onBlur}
      // What the tray keeps (whole °F): 177 °C typed is 350.6 °F, kept as 351 °F; an untouched 350 °F stays 350.
      hint={own === undefined && typeof valueF === 'number' ? `Kept as ${valueF} °F (whole degrees).` : undefined}
      // Empty: the form's own refusal (in °F terms) said as what is missing.
      error={own ?? (text.trim() === '' && error ? 'Give the oven temperature' : undefined)}
    />
  );
}
