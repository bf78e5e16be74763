import { describe, expect, it, vi } from 'vitest';
import { useState } from 'react';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { PlatePreview, previewParts } from '@/features/assemblies/components/plate-preview';
import { jsonResponse, renderInApp } from './render';

// The plate editor's live numbers; invented values (the server's arithmetic is checked in assemblies.api.test.ts).
describe('plate preview', () => {
  it('sends only the parts that can be worked out', () => {
    expect(previewParts({ trays: [], addOns: [] })).toBeNull();
    expect(
      previewParts({
        trays: [{ trayId: NaN, portions: 1 }, { trayId: 4, portions: 2 }],
        addOns: [
          { ingredientId: 0, amountText: '1', unit: 'Tbsp' },
          { ingredientId: 9, amountText: ' ', unit: 'g' },
          { ingredientId: 9, amountText: '30', unit: 'g' },
        ],
      }),
    ).toEqual({ trays: [{ trayId: 4, portions: 2 }], addOns: [{ ingredientId: 9, amountText: '30', unit: 'g' }] });
  });

  it('shows what the plate adds up to once typing stops, and the part the server cannot use', async () => {
    const fetchMock = vi.fn(async (_url: string, init?: RequestInit) => {
      const body = JSON.parse(String(init?.body)) as { addOns: { unit: string }[] };
      if (body.addOns[0]?.unit === 'cup') {
        return jsonResponse({ type: 'about:blank', title: 'Invalid', status: 400, code: 'validation', detail: 'x', errors: { 'addOns.0.unit': ['Test cheese has no weight for "cup"'] } }, 400);
      }
      return jsonResponse({ macros: { kcal: 172.7, fatG: 14.8, proteinG: 9.9, carbsG: 1, fiberG: 0, netCarbsG: 1 }, allergens: ['milk'], complete: true, addOnGrams: [21] });
    });
    vi.stubGlobal('fetch', fetchMock);
    // The form as the coach changes it: first a slice, then cups of an ingredient that has no density.
    function Form() {
      const [unit, setUnit] = useState('slice');
      return (
        <>
          <button onClick={() => setUnit('cup')}>cups</button>
          <PlatePreview parts={{ trays: [], addOns: [{ ingredientId: 9, amountText: '1', unit }] }} />
        </>
      );
    }
    renderInApp(<Form />);
    await waitFor(() => expect(screen.getByText('173 kcal')).toBeTruthy());
    expect(screen.getByText('Contains: Milk')).toBeTruthy();
    expect(screen.getByText('Add-ons weigh: 1 slice ≈ 21 g')).toBeTruthy();
    expect(fetchMock).toHaveBeenCalledTimes(1);
    expect(String(fetchMock.mock.calls[0]![0])).toContain('/api/assemblies/preview');

    fireEvent.click(screen.getByText('cups'));
    await waitFor(() => expect(screen.getByText(/has no weight for "cup"/)).toBeTruthy());
  });
});
