import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { BakeRuleDto, OvenDto } from '@shared/schemas/bake-setup.schema';
import { BakeRuleFormCard } from '@/features/bake-runs/components/bake-rule-form';
import { OvenFormCard } from '@/features/bake-runs/components/oven-form';
import { jsonResponse, renderInApp, staleResponse } from './render';

// An invented oven and bake rule (demo-like values), as GET /api/bake-setup lists them.
const oven = (o: Partial<OvenDto> = {}): OvenDto => ({
  id: 4, name: 'Left oven', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500, maxC: 260, version: 3, updatedAt: '2026-01-01T00:00:00Z', ...o,
});
const rule = (r: Partial<BakeRuleDto> = {}): BakeRuleDto => ({
  id: 9, category: 'meat', label: 'Meat tray', tempF: 400, tempC: 204, minMinutes: 20, maxMinutes: 30, handsOnMinutes: 10, toleranceF: 10,
  donenessCue: 'Juices run clear', minInternalF: 165, restMinutes: 0, minInternalSource: 'USDA FSIS Safe Minimum Internal Temperatures chart',
  rackPreference: 'middle', convectionDeltaF: 25, crowdingPct: 10, bakeSource: 'common practice, no source', note: '', version: 2, updatedAt: '2026-01-01T00:00:00Z', ...r,
});

/** A server where someone else saved `theirs` meanwhile: a save from an older version is refused with it. */
function serving(theirs: { version: number }) {
  const sent: Record<string, unknown>[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (_url: string, init?: RequestInit) => {
      const body = JSON.parse(String(init?.body ?? '{}')) as Record<string, unknown>;
      sent.push(body);
      return body.version === theirs.version ? jsonResponse({ ...theirs, ...body, version: theirs.version + 1 }) : staleResponse(theirs);
    }),
  );
  return sent;
}

afterEach(() => vi.unstubAllGlobals());

describe('two people editing one oven', () => {
  it('keeps what was typed when someone else saved meanwhile, and saves it over theirs only when asked', async () => {
    const sent = serving(oven({ name: 'Oven by the door', racks: 3, version: 4 }));
    const done = vi.fn();
    renderInApp(<OvenFormCard oven={oven()} unit="F" onDone={done} />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Big oven' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save oven' }));
    expect(await screen.findByText('Someone else saved this oven while you were editing')).toBeTruthy();
    expect(screen.getByText('Their version (4) is saved. Your changes are still here in the form: nothing is lost.')).toBeTruthy();
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Big oven');
    expect(done).not.toHaveBeenCalled();
    fireEvent.click(screen.getByRole('button', { name: 'Keep mine and save again' }));
    await waitFor(() => expect(done).toHaveBeenCalled());
    expect(sent.map((b) => [b.name, b.racks, b.version])).toEqual([
      ['Big oven', 2, 3],
      ['Big oven', 2, 4],
    ]);
  });

  it('puts their version in the form when asked, and saves from it', async () => {
    const sent = serving(oven({ name: 'Oven by the door', racks: 3, heatFPerMin: 30, version: 4 }));
    renderInApp(<OvenFormCard oven={oven()} unit="C" onDone={() => undefined} />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Big oven' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save oven' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Reload their version' }));
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Oven by the door'));
    expect((screen.getByLabelText('Racks') as HTMLInputElement).value).toBe('3');
    // 30 °F per minute is 16.7 °C per minute (× 5/9, NIST SP 811 for a difference).
    expect((screen.getByLabelText('Heating rate (°C per minute)') as HTMLInputElement).value).toBe('16.7');
    expect(screen.queryByText('Someone else saved this oven while you were editing')).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Save oven' }));
    await waitFor(() => expect(sent).toHaveLength(2));
    // From their version: its stored rate goes back untouched (30, not 16.7 °C × 9/5 = 30.06).
    expect(sent[1]).toMatchObject({ name: 'Oven by the door', racks: 3, heatFPerMin: 30, version: 4 });
  });

  it('stays on the version it was opened from when the list under it refreshes', async () => {
    const sent = serving(oven({ name: 'Oven by the door', version: 4 }));
    // The bake setup refetched (window focus) with someone else's save: the open form is not moved onto it.
    function Refreshing() {
      const [listed, setListed] = useState(oven());
      return (
        <>
          <button type="button" onClick={() => setListed(oven({ name: 'Oven by the door', version: 4 }))}>
            Refetch
          </button>
          <OvenFormCard oven={listed} unit="F" onDone={() => undefined} />
        </>
      );
    }
    renderInApp(<Refreshing />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Big oven' } });
    fireEvent.click(screen.getByRole('button', { name: 'Refetch' }));
    fireEvent.click(screen.getByRole('button', { name: 'Save oven' }));
    expect(await screen.findByText('Someone else saved this oven while you were editing')).toBeTruthy();
    expect(sent.map((b) => b.version)).toEqual([3]);
  });

  it('names a clashing name on its field', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        jsonResponse({ status: 409, code: 'duplicate', title: 'Conflict', detail: 'An oven with this name already exists', errors: { name: ['An oven with this name already exists'] } }, 409),
      ),
    );
    renderInApp(<OvenFormCard oven={null} unit="F" onDone={() => undefined} />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Left oven' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save oven' }));
    expect(await screen.findByText('An oven with this name already exists')).toBeTruthy();
    expect(screen.queryByText(/Close this form|Someone else saved/)).toBeNull();
  });
});

describe('two people editing one bake rule', () => {
  it('keeps what was typed when someone else saved meanwhile, and saves it over theirs only when asked', async () => {
    const sent = serving(rule({ label: 'Meat (theirs)', version: 3 }));
    const done = vi.fn();
    renderInApp(<BakeRuleFormCard rule={rule()} unit="F" onDone={done} />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Meat (mine)' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save rule' }));
    expect(await screen.findByText('Someone else saved this bake rule while you were editing')).toBeTruthy();
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Meat (mine)');
    // The form's own Save sends the version it started from again: refused, nothing overwritten.
    fireEvent.click(screen.getByRole('button', { name: 'Save rule' }));
    await waitFor(() => expect(sent).toHaveLength(2));
    fireEvent.click(await screen.findByRole('button', { name: 'Keep mine and save again' }));
    await waitFor(() => expect(done).toHaveBeenCalled());
    expect(sent.map((b) => [b.label, b.version])).toEqual([
      ['Meat (mine)', 2],
      ['Meat (mine)', 2],
      ['Meat (mine)', 3],
    ]);
  });

  it('puts their version in the form when asked', async () => {
    serving(rule({ label: 'Meat (theirs)', tempF: 425, tempC: 218, version: 3 }));
    renderInApp(<BakeRuleFormCard rule={rule()} unit="F" onDone={() => undefined} />);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Meat (mine)' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save rule' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Reload their version' }));
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Meat (theirs)'));
    expect((screen.getByLabelText('Set temperature (°F)') as HTMLInputElement).value).toBe('425');
  });
});
