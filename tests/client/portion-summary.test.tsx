import { describe, expect, it } from 'vitest';
import { portionCount } from '@shared/domain/inventory';
import type { BoardTrayDto } from '@shared/schemas/weeks.schema';
import { portionSummary } from '@/features/weeks/components/inventory-panel';

// Invented boards: one base tray cut into 12 portions, baked on Sun 4 Jan; each plate takes one portion of it.
const PREP = '2026-01-04';
function board(plates: number, trayCount: number) {
  const cells = Array.from({ length: plates }, (_, i) => ({
    clientId: 1,
    date: `2026-01-${String(5 + (i % 5)).padStart(2, '0')}`,
    householdMultiplier: 1,
    portions: [{ trayId: '7', quantity: 1 }],
  }));
  const trays = [{ trayId: 7, name: 'Egg slab', prepDate: PREP, trayCount, portionsPerTray: 12, fridgeDays: 4, freezerWeeks: 8 }] as BoardTrayDto[];
  const inventory = portionCount({ prepDates: [PREP], cells: cells as never, batches: [{ trayId: '7', prepDate: PREP, trayCount, portionsPerTray: 12 }] });
  return { trays, inventory };
}

describe('the board\'s portion summary', () => {
  it('counts what is short first: 30 plates, 2 trays of 12 → 6 portions short', () => {
    expect(portionSummary(board(30, 2))).toEqual({ tone: 'warn', title: '6 portions short' });
  });

  it('calls the last tray\'s leftovers spare, not extra: 30 plates, 3 trays → every portion baked, 6 spare', () => {
    expect(portionSummary(board(30, 3))).toEqual({ tone: 'info', title: 'Every portion is baked', detail: '6 spare portions from cutting whole trays.' });
    expect(portionSummary(board(24, 2)).detail).toBeUndefined();
  });

  it('says when whole trays bake more than the board needs: 10 plates, 4 trays → 3 trays more (38 spare)', () => {
    expect(portionSummary(board(10, 4))).toEqual({
      tone: 'warn',
      title: 'Every portion is baked, with 3 trays more than the board needs',
      detail: '38 spare portions in all. "Set tray counts to cover the need" bakes only what the plates use.',
    });
  });

  it('says when trays are baked for no plate, and when nothing is needed yet', () => {
    expect(portionSummary(board(0, 2))).toMatchObject({ tone: 'warn', title: '2 trays to bake, no plate uses them' });
    expect(portionSummary(board(0, 0))).toMatchObject({ tone: 'info', title: 'No portions needed yet' });
  });
});
