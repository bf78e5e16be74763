import { describe, expect, it } from 'vitest';
import { render } from '@testing-library/react';
import type { ContainerLabelDto } from '@shared/schemas/shopping.schema';
import { LabelSheet } from '@/features/shopping/components/label-sheet';

// An invented plate label (a household of two, frozen on prep day).
const label: ContainerLabelDto = {
  kind: 'plate',
  title: 'Ada Example',
  clientId: 1,
  subtitle: 'Egg slab plate',
  planned: { date: '2026-01-06', slot: 'breakfast' },
  portions: '2',
  madeOn: '2026-01-04',
  eatBy: '2026-01-06',
  freezeBy: null,
  frozenBestBy: '2026-03-01',
  reheat: 'Microwave covered 60–90 s',
  macros: { calories: '150', fat: '13 g', carbohydrate: '1 g', protein: '8 g', netCarbs: '1 g' },
  allergens: ['milk'],
  allergenText: 'Contains: Milk',
  onClientList: [],
  url: 'http://example.test/my-plates?date=2026-01-06',
  qr: 'data:image/svg+xml;base64,PHN2Zy8+',
  shortTrays: [],
};

describe('a container label', () => {
  it('writes every day as people read it (no ISO dates), with the day, the portions and the frozen plate’s best-by', () => {
    const { container } = render(<LabelSheet layout="letter-2x5" labels={[label]} />);
    const text = container.textContent ?? '';
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    expect(text).toContain('Tue, Jan 6 breakfast · 2 portions · Egg slab plate');
    expect(text).toContain('Made Sun, Jan 4 · Eat by Tue, Jan 6');
    expect(text).toContain('Frozen; best quality by Sun, Mar 1');
    expect(text).not.toContain('Freeze by');
  });

  it('marks the allergens on the client’s own list in a bordered line of words (it prints without colour), and nothing when there is none', () => {
    const marked = { ...label, allergens: ['milk', 'egg', 'wheat'], allergenText: 'Contains: Milk, Egg, Wheat', onClientList: ['milk', 'egg'] } satisfies ContainerLabelDto;
    const { container, getByText } = render(<LabelSheet layout="a4-3x7" labels={[marked, label]} />);
    const line = getByText('⚠ On the client’s allergen list: Milk, Egg');
    expect(line.className).toMatch(/\bborder-black\b/);
    expect(container.textContent!.match(/On the client’s allergen list/g)).toHaveLength(1);
  });

  it('a spare portion has no day or portions line, and a fridge portion says when to freeze it at the latest', () => {
    const spare: ContainerLabelDto = { ...label, kind: 'spare', title: 'Egg slab', subtitle: 'Spare portion', planned: null, portions: null, eatBy: '2026-01-08', freezeBy: '2026-01-08', frozenBestBy: null };
    const { container } = render(<LabelSheet layout="letter-2x5" labels={[spare]} />);
    const text = container.textContent ?? '';
    expect(text).toContain('Spare portion');
    expect(text).not.toContain('portions ·');
    expect(text).toContain('Freeze by Thu, Jan 8');
    expect(text).not.toContain('Frozen;');
  });
});
