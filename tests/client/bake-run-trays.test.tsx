import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { planBakeRun } from '@shared/domain/bake-run';
import { BakeRunView } from '@/features/bake-runs/components/bake-run-view';

// An invented run: two trays at 350 °F in one oven of two racks (rates are the scheduler's common-practice defaults).
const run = planBakeRun({
  start: '2026-12-06T08:00',
  cooks: 1,
  ambientF: 70,
  ovens: [{ name: 'Left oven', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 }],
  trays: [
    { id: 'a', name: 'Spinach egg slab', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 },
    { id: 'b', name: 'Roasted radish tray', tempF: 350, minMinutes: 20, maxMinutes: 24, handsOnMinutes: 0 },
  ],
});
const clock = (iso: string) => iso.slice(11, 16);

describe('the trays of a bake run', () => {
  it('gives each tray its oven, rack, set point, times in and out, and pull-by, as a card a phone shows whole', () => {
    render(<BakeRunView run={run} unit="F" />);
    const cards = within(screen.getByRole('list', { name: 'Trays of the run' })).getAllByRole('listitem');
    expect(cards).toHaveLength(run.trays.length);
    for (const [i, t] of run.trays.entries()) {
      const text = cards[i].textContent!.replace(/\s+/g, ' ');
      expect(text).toContain(t.name);
      expect(text).toContain(`Left oven · rack ${t.rack} · 350 °F`);
      expect(text).toContain(`In${clock(t.inAt)}`);
      expect(text).toContain(`Check / out${clock(t.outAt)} (${t.bakeMinutes} min)`);
      expect(text).toContain(`Pull by${clock(t.pullByAt)}`);
    }
    // The same trays in the table wider screens show.
    const rows = within(screen.getByRole('region', { name: 'Trays of the run, as a table' })).getAllByRole('row');
    expect(rows).toHaveLength(run.trays.length + 1);
  });
});
