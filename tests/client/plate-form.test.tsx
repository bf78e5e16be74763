import { describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import { AssemblyForm } from '@/features/assemblies/components/assembly-form';
import { jsonResponse, renderInApp } from './render';

// The plate form opened on an existing plate (invented names); fetch answers the tray list and any preview.
function open(trays: { id: number; name: string }[]) {
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string) =>
      String(url).includes('/trays')
        ? jsonResponse(trays)
        : jsonResponse({ macros: { kcal: 0, fatG: 0, proteinG: 0, carbsG: 0, fiberG: 0, netCarbsG: 0 }, allergens: [], complete: true, addOnGrams: [] }),
    ),
  );
  renderInApp(
    <AssemblyForm
      initial={{ name: 'Old plate', description: '', trays: [{ trayId: 5, portions: 2 }], addOns: [], assemblySteps: [], reheatSteps: [] }}
      trayNames={{ 5: 'Old slab' }}
      onSubmit={vi.fn()}
    />,
  );
}

const shownTray = () => {
  const el = screen.getByLabelText('Base tray') as HTMLSelectElement;
  return el.options[el.selectedIndex]?.text;
};

describe('the plate form on an existing plate', () => {
  it('shows its base tray once the tray list has loaded', async () => {
    open([{ id: 4, name: 'Bacon tray' }, { id: 5, name: 'Old slab' }]);
    await waitFor(() => expect(shownTray()).toBe('Old slab'));
  });

  it('keeps an archived base tray choosable, marked as archived', async () => {
    open([{ id: 4, name: 'Bacon tray' }]);
    await waitFor(() => expect(screen.getByRole('option', { name: 'Bacon tray' })).toBeTruthy());
    expect(shownTray()).toBe('Old slab (archived)');
  });
});
