import { afterEach, describe, expect, it } from 'vitest';
import { act, fireEvent, render, screen } from '@testing-library/react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { Cautions } from '@/components/domain/cautions';
import { OvenTemperatureField } from '@/components/domain/oven-temperature-field';
import { setTempScale } from '@/lib/temp-scale';
import { TRAY_OVEN_LIMITS_F } from '@shared/schemas/trays.schema';
import type { TempScale } from '@shared/domain/temperature';
import { renderInApp } from './render';

afterEach(() => setTempScale('F'));

/** A form holding a tray's oven set point in °F, as the tray editor does, showing the value it would save. */
function Harness({ scale }: { scale: TempScale }) {
  const form = useForm<{ tempF: number | string }>({ defaultValues: { tempF: 350 } });
  const value = useWatch({ control: form.control, name: 'tempF' });
  return (
    <>
      <Controller
        control={form.control}
        name="tempF"
        render={({ field }) => <OvenTemperatureField scale={scale} valueF={field.value} onChangeF={field.onChange} limitsF={TRAY_OVEN_LIMITS_F} />}
      />
      <output aria-label="Saved value">{JSON.stringify(value)}</output>
      {/* What choosing a bake category does: it sets the °F value. */}
      <button type="button" onClick={() => form.setValue('tempF', 400)}>
        Choose a category at 400 °F
      </button>
    </>
  );
}

describe('temperatures in the reader’s scale', () => {
  it('a °C reader types the oven temperature in °C; the form keeps the nearest whole °F', () => {
    render(<Harness scale="C" />);
    const saved = () => JSON.parse(screen.getByLabelText('Saved value').textContent!);
    const field = screen.getByLabelText('Oven temperature (°C)') as HTMLInputElement;
    // 350 °F = 176.7 °C: written 177 (NIST SP 811, °C = (°F − 32) × 5/9, whole degrees as on oven dials).
    expect(field.value).toBe('177');
    // Untouched, the tray keeps its 350 °F (177 °C typed again would be 351 °F).
    expect(screen.getByText('Kept as 350 °F (whole degrees).')).toBeTruthy();
    fireEvent.change(field, { target: { value: '180' } });
    // 180 °C × 9/5 + 32 = 356 °F exactly.
    expect(saved()).toBe(356);
    expect(field.value).toBe('180');
    expect(screen.getByText('Kept as 356 °F (whole degrees).')).toBeTruthy();
    // 150 °F (the least a tray bakes at) is 65.6 °C: 60 °C is refused in °C words.
    fireEvent.change(field, { target: { value: '60' } });
    expect(screen.getByText('At least 66 °C')).toBeTruthy();
    fireEvent.change(field, { target: { value: '180.5' } });
    expect(screen.getByText('Use whole degrees')).toBeTruthy();
    // A value set from outside (a bake category chosen) shows in °C: 400 °F = 204.4 °C.
    fireEvent.click(screen.getByRole('button', { name: 'Choose a category at 400 °F' }));
    expect((screen.getByLabelText('Oven temperature (°C)') as HTMLInputElement).value).toBe('204');
  });

  it('a °F reader types °F as before', () => {
    render(<Harness scale="F" />);
    const field = screen.getByLabelText('Oven temperature (°F)') as HTMLInputElement;
    expect(field.value).toBe('350');
    fireEvent.change(field, { target: { value: '375' } });
    expect(JSON.parse(screen.getByLabelText('Saved value').textContent!)).toBe('375');
  });

  it('the safety notes put the reader’s scale first', () => {
    setTempScale('C');
    renderInApp(<Cautions />);
    // FDA Food Code §3-403.11 writes "74°C (165°F)"; USDA FSIS, the freezer at "0 °F (−18 °C)".
    expect(screen.getByText(/^Reheat until every part reaches 74 °C \(165 °F\)\./)).toBeTruthy();
    expect(screen.getByText(/Keep the refrigerator at 4 °C \(40 °F\) or below and the freezer at −18 °C \(0 °F\) or below/)).toBeTruthy();
    act(() => setTempScale('F'));
    expect(screen.getByText(/^Reheat until every part reaches 165 °F \(74 °C\)\./)).toBeTruthy();
  });
});
