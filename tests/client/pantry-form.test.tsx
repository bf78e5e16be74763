import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { MeDto } from '@shared/schemas/auth.schema';
import { AddPantryItem, startingAmount } from '@/features/shopping/components/pantry-forms';
import { jsonResponse, queryClientFor, renderInApp, signedIn } from './render';

// The assistant's "Add what you have" form; invented people and ingredients (only the fields the form reads).
const assistant = (unitSystem: MeDto['unitSystem']) => signedIn({ id: 2, email: 'assistant@example.test', name: 'Sam Helper', role: 'assistant', unitSystem });
const eggs = { id: 11, name: 'Eggs, example', densityGPerMl: null, pieceWeights: { large: 50 }, purchase: { amount: 12, unit: 'large', label: 'dozen' } };
const cream = { id: 12, name: 'Cream, example', densityGPerMl: 1.01, pieceWeights: {}, purchase: { amount: 1, unit: 'quart', label: 'carton' } };

async function show(unitSystem: MeDto['unitSystem']) {
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse({ items: [eggs, cream], total: 2, page: 1, pageSize: 20 })));
  renderInApp(<AddPantryItem unitSystem={unitSystem} />, queryClientFor(assistant(unitSystem)));
  await waitFor(() => expect(screen.getByRole('option', { name: 'Eggs, example' })).toBeTruthy());
}

const unit = () => screen.getByLabelText('Unit') as HTMLSelectElement;
const choose = (id: number) => fireEvent.change(screen.getByLabelText('Ingredient'), { target: { value: String(id) } });

describe('adding to the pantry', () => {
  it("starts in the reader's mass unit, and in the piece a count-bought item comes in", async () => {
    await show('us');
    expect(unit().value).toBe('oz');
    choose(eggs.id);
    await waitFor(() => expect(unit().value).toBe('large'));
    choose(cream.id);
    await waitFor(() => expect(unit().value).toBe('oz'));
    // Units read as written (NIST SP 811: mL and L), the codes stay the values sent.
    const labels = Array.from(unit().options).map((o) => o.textContent);
    expect(labels).toContain('mL');
    expect(labels).toContain('cup'); // volume units come with a density
    expect(Array.from(unit().options).find((o) => o.textContent === 'mL')!.value).toBe('ml');
  });

  it('starts in grams for a metric reader', async () => {
    await show('metric');
    expect(unit().value).toBe('g');
    choose(eggs.id);
    await waitFor(() => expect(unit().value).toBe('large'));
  });

  it("opens a row's amount in the reader's unit: ounces for a US reader, as stored otherwise", () => {
    // 100 g ÷ 28.349523125 g per oz (NIST Handbook 44 App. C) = 3.527… oz, to 0.01.
    expect(startingAmount({ amount: 100, unit: 'g' }, 'us')).toEqual({ amount: '3.53', unit: 'oz' });
    expect(startingAmount({ amount: 100, unit: 'g' }, 'metric')).toEqual({ amount: '100', unit: 'g' });
    expect(startingAmount({ amount: 18, unit: 'large' }, 'us')).toEqual({ amount: '18', unit: 'large' });
  });
});
