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

describe('the parts of a bake run to jump to', () => {
  it('names each part the page shows, each link landing on that part’s heading', () => {
    // A run planned for another day (no timers) and no cooling record: the planner's page.
    const { unmount } = render(<BakeRunView run={run} unit="F" />);
    const nav = screen.getByRole('navigation', { name: 'On this page' });
    const links = within(nav).getAllByRole('link');
    expect(links.map((a) => a.textContent)).toEqual(['Timeline', 'Trays', 'Run sheet', 'Food safety']);
    for (const a of links) {
      const target = document.getElementById(a.getAttribute('href')!.slice(1));
      expect(target, a.textContent!).not.toBeNull();
      expect(target!.textContent).toContain(a.textContent!);
    }
    unmount();
    // A prep week's page: its cooling record is a part too.
    render(<BakeRunView run={run} unit="F" coolingRecord={<h2 id="cooling-record-title">Cooling record</h2>} />);
    const withRecord = within(screen.getByRole('navigation', { name: 'On this page' })).getAllByRole('link');
    expect(withRecord.map((a) => a.getAttribute('href'))).toEqual(['#cooling-record-title', '#run-timeline', '#run-trays', '#run-sheet', '#run-safety']);
  });
});
