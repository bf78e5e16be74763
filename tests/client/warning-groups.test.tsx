import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import { groupWords, WarningGroups } from '@/features/weeks/components/warning-groups';
import type { WeekWarning } from '@shared/domain/week-check';

// An invented board's names (demo-style data, for the wording only).
const names: Record<string, string> = { '1': 'Zed Young', '2': 'anna de Wit', '3': 'Bo Lee', '4': 'Cy Park', '5': 'Dana Whitlock' };
const clientName = (id: string) => names[id] ?? 'A client';
const day = (clientId: string, date: string): WeekWarning => ({ severity: 'block', clientId, date, kind: 'past-eat-by', slot: 'lunch', trayId: '9', prepDate: '2026-01-04', eatBy: '2026-01-07' });

describe('the problem list by kind', () => {
  it('says how many, of what, and whose, names in the order people read them (ECMA-402 list format, en-US)', () => {
    expect(groupWords({ kind: 'net-carbs-over', allergen: null, allowed: false, count: 1, clientIds: ['1'] }, clientName)).toBe('1 day over the net-carb cap: Zed Young');
    expect(groupWords({ kind: 'protein-short', allergen: null, allowed: false, count: 4, clientIds: ['1', '2', '3'] }, clientName)).toBe(
      '4 days short of protein: anna de Wit, Bo Lee, and Zed Young',
    );
    expect(groupWords({ kind: 'allergen', allergen: 'milk', allowed: true, count: 2, clientIds: ['4', '3'] }, clientName)).toBe(
      '2 meals holding milk, on the client’s allergen list, allowed by the coach: Bo Lee and Cy Park',
    );
    expect(groupWords({ kind: 'allergen', allergen: 'tree-nuts', allowed: false, count: 1, clientIds: ['5'] }, clientName)).toBe(
      '1 meal holding tree nuts, on the client’s allergen list: Dana Whitlock',
    );
    // More than three clients: two names and a count.
    expect(groupWords({ kind: 'dislike', allergen: null, allowed: false, count: 6, clientIds: ['1', '2', '3', '4', '5'] }, clientName)).toBe(
      '6 meals with a dislike: anna de Wit, Bo Lee, and 3 other clients',
    );
  });

  it('lists the kinds and leads to the board’s flagged clients', () => {
    const onShowFlagged = vi.fn();
    render(<WarningGroups warnings={[day('1', '2026-01-08'), day('1', '2026-01-09'), day('2', '2026-01-08')]} clientName={clientName} onShowFlagged={onShowFlagged} />);
    expect(screen.getAllByRole('listitem').map((li) => li.textContent)).toEqual(['3 meals past the eat-by date: anna de Wit and Zed Young']);
    fireEvent.click(screen.getByRole('button', { name: 'Show only those clients' }));
    expect(onShowFlagged).toHaveBeenCalledOnce();
  });
});
