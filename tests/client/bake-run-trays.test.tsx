import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { BakeRunView } from '@/features/bake-runs/components/bake-run-view';
import { twoTrayRun } from './bake-run-fixtures';

const run = twoTrayRun;
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
