import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { BakeRuleDto, OvenDto } from '@shared/schemas/bake-setup.schema';
import { BakeRuleFormCard } from '@/features/bake-runs/components/bake-rule-form';
import { OvenFormCard } from '@/features/bake-runs/components/oven-form';
import { sentAsF, shownIn } from '@/features/bake-runs/components/scale-fields';
import { jsonResponse, renderInApp } from './render';

// Invented oven and rule (demo-like values); the conversions are NIST SP 811's: °C = (°F − 32) × 5/9 for a
// temperature, × 5/9 alone for a difference or a rate.
const oven: OvenDto = { id: 4, name: 'Left oven', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500, maxC: 260, version: 3, updatedAt: '2026-01-01T00:00:00Z' };
const rule: BakeRuleDto = {
  id: 9,
  category: 'meat',
  label: 'Meat tray',
  tempF: 400,
  tempC: 204,
  minMinutes: 20,
  maxMinutes: 30,
  handsOnMinutes: 10,
  toleranceF: 10,
  donenessCue: 'Juices run clear',
  minInternalF: 165,
  restMinutes: 0,
  minInternalSource: 'USDA FSIS Safe Minimum Internal Temperatures chart',
  rackPreference: 'middle',
  convectionDeltaF: 25,
  crowdingPct: 10,
  bakeSource: 'common practice, no source',
  note: '',
  version: 2,
  updatedAt: '2026-01-01T00:00:00Z',
};

const sent: { url: string; body: Record<string, unknown> }[] = [];
beforeEach(() => {
  sent.length = 0;
  vi.stubGlobal(
    'fetch',
    vi.fn((url: string, init?: RequestInit) => {
      sent.push({ url, body: JSON.parse(String(init?.body ?? '{}')) as Record<string, unknown> });
      return Promise.resolve(jsonResponse({}));
    }),
  );
});
afterEach(() => vi.unstubAllGlobals());

describe('bake rules and ovens typed in °C', () => {
  it('shows stored °F in °C to one decimal, and sends °F back', () => {
    // USDA FSIS pairs 165 °F with 73.9 °C; a 25 °F difference is 13.9 °C (no 32° offset).
    expect(shownIn(165, 'temp', 'C')).toBe('73.9');
    expect(shownIn(25, 'delta', 'C')).toBe('13.9');
    expect(shownIn(165, 'temp', 'F')).toBe('165');
    expect(sentAsF('74', 165, true, 'temp', 'C')).toBe(165.2);
    expect(sentAsF('10', 15, true, 'delta', 'C')).toBe(18);
    // Left as it was: the stored value, not 73.9 °C converted back (165.02 °F).
    expect(sentAsF('73.9', 165, false, 'temp', 'C')).toBe(165);
    expect(sentAsF('', null, true, 'temp', 'C')).toBeNull();
  });

  it('an oven’s rates are typed in °C per minute; a rate left alone keeps its stored °F', async () => {
    renderInApp(<OvenFormCard oven={oven} unit="C" onDone={() => undefined} />);
    const heat = screen.getByLabelText('Heating rate (°C per minute)') as HTMLInputElement;
    expect(heat.value).toBe('13.9');
    expect(screen.getByText('Default 13.9 (common practice, no source)')).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Cooling rate, door ajar (°C per minute)'), { target: { value: '10' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save oven' }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0].url).toBe('/api/ovens/4');
    // 10 °C per minute × 9/5 = 18 °F per minute; the maximum left as it was keeps its °F.
    expect(sent[0].body).toMatchObject({ heatFPerMin: 25, coolFPerMin: 18, maxF: 500, version: 3 });
    expect(sent[0].body).not.toHaveProperty('maxC');
  });

  it('a rule’s tolerance, minimum internal and convection step are typed in °C', async () => {
    renderInApp(<BakeRuleFormCard rule={rule} unit="C" onDone={() => undefined} />);
    expect((screen.getByLabelText('Tolerance (± °C)') as HTMLInputElement).value).toBe('5.6');
    const internal = screen.getByLabelText('Minimum internal (°C)') as HTMLInputElement;
    expect(internal.value).toBe('73.9');
    expect((screen.getByLabelText('Convection: lower by (°C)') as HTMLInputElement).value).toBe('13.9');
    // 74 °C, the FDA Food Code's reheating figure: 165.2 °F.
    fireEvent.change(internal, { target: { value: '74' } });
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0].url).toBe('/api/bake-rules/9');
    // The set temperature left as it was: 400 °F as stored (204 °C would come back as 399.2 °F).
    expect(sent[0].body).toMatchObject({ minInternalF: 165.2, toleranceF: 10, convectionDeltaF: 25, tempF: 400, version: 2 });
    expect(sent[0].body).not.toHaveProperty('tempC');
  });

  it('in °F nothing is converted', async () => {
    renderInApp(<BakeRuleFormCard rule={rule} unit="F" onDone={() => undefined} />);
    fireEvent.change(screen.getByLabelText('Tolerance (± °F)'), { target: { value: '15' } });
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0].body).toMatchObject({ toleranceF: 15, minInternalF: 165, convectionDeltaF: 25, tempF: 400 });
  });
});
