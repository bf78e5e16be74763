import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { TrayShopping } from '@/features/shopping/components/tray-shopping';
import { jsonResponse, renderInApp } from './render';

// An invented list answer (POST /api/shopping/preview): eggs by the dozen, cheese without a price.
const answer = (dozens: number) => ({
  weekId: null,
  aisles: [
    {
      aisle: 'dairy',
      label: 'Dairy & eggs',
      items: [
        { ingredientId: 1, name: 'Egg, whole, raw', aisle: 'dairy', aisleLabel: 'Dairy & eggs', baseUnit: 'large', needed: 12 * dozens, inPantry: 0, fromPantry: 0, toBuy: 12 * dozens, neededText: `${12 * dozens} large`, toBuyText: `${12 * dozens} large`, purchase: { label: 'dozen', packages: dozens, size: 12, unit: 'large', spare: 0, spareText: '0' }, costCents: 399 * dozens, check: { checked: false, checkedBy: null, checkedAt: null } },
        { ingredientId: 2, name: 'Feta', aisle: 'dairy', aisleLabel: 'Dairy & eggs', baseUnit: 'g', needed: 200, inPantry: 0, fromPantry: 0, toBuy: 200, neededText: '7 oz', toBuyText: '7 oz', purchase: null, costCents: null, check: { checked: false, checkedBy: null, checkedAt: null } },
      ],
    },
  ],
  itemCount: 2,
  checkedCount: 0,
  totalCostCents: 399 * dozens,
  costComplete: false,
  problems: [],
  bought: null,
});

afterEach(() => vi.unstubAllGlobals());

describe('what to buy for a tray', () => {
  it('asks for the number of trays typed, shows packages and the estimate, and refuses a count out of range', async () => {
    const bodies: unknown[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        const body = JSON.parse(String(init?.body));
        bodies.push({ url, body });
        return jsonResponse(answer(body.trays[0].count));
      }),
    );
    renderInApp(<TrayShopping trayId={5} />);
    expect(await screen.findByText('1 × dozen')).toBeTruthy();
    expect(screen.getByText('7 oz')).toBeTruthy();
    expect(screen.getByText('Estimated $3.99 or more (some items have no price)')).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Trays'), { target: { value: '2' } });
    expect(await screen.findByText('2 × dozen')).toBeTruthy();
    expect(bodies).toEqual([
      { url: '/api/shopping/preview', body: { trays: [{ trayId: 5, count: 1 }] } },
      { url: '/api/shopping/preview', body: { trays: [{ trayId: 5, count: 2 }] } },
    ]);
    fireEvent.change(screen.getByLabelText('Trays'), { target: { value: '0' } });
    expect(screen.getByText('A whole number from 1 to 50')).toBeTruthy();
    await waitFor(() => expect(bodies).toHaveLength(2));
    expect(screen.getByText('2 × dozen')).toBeTruthy();
  });
});
