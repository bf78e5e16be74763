import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import type { ContainerLabelDto, LabelSheetDto, ShortTrayDto } from '@shared/schemas/shopping.schema';
import { Component as LabelsPage } from '@/app/routes/shopping/labels.route';
import { jsonResponse, renderAtRoute, signedIn } from './render';

// Invented labels of week 7, prep day Sun 4 Jan 2026: two plates that use a tray, one that does not.
const plate = (title: string, shortTrays: string[], clientId = 1): ContainerLabelDto => ({
  kind: 'plate',
  title,
  clientId,
  subtitle: 'Egg slab plate',
  planned: { date: '2026-01-05', slot: 'breakfast' },
  portions: null,
  madeOn: '2026-01-04',
  eatBy: '2026-01-08',
  freezeBy: null,
  frozenBestBy: null,
  reheat: null,
  macros: null,
  allergens: [],
  allergenText: 'No major allergens listed',
  onClientList: [],
  url: 'http://example.test/my-plates?date=2026-01-05',
  qr: 'data:image/svg+xml;base64,PHN2Zy8+',
  shortTrays,
});

const sheet = (short: ShortTrayDto[], labels: ContainerLabelDto[]): LabelSheetDto => ({
  layout: 'letter-2x5',
  prepDate: '2026-01-04',
  prepDates: ['2026-01-04'],
  labels,
  short,
});

const bacon: ShortTrayDto = { trayId: 3, trayName: 'Oven bacon', portions: 6, lostTrays: 1, trayCount: 2, plateLabels: 2 };
const slab: ShortTrayDto = { trayId: 4, trayName: 'Chive egg slab', portions: 1, lostTrays: 0, trayCount: 1, plateLabels: 0 };

afterEach(() => vi.unstubAllGlobals());

const renderAs = (role: 'coach' | 'assistant', data: LabelSheetDto) => {
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(data)));
  renderAtRoute(<LabelsPage />, '/weeks/:weekId/labels', '/weeks/7/labels', signedIn({ role }));
};

describe('container labels of a prep day short of a tray', () => {
  it('tells the assistant which trays are short and why, marks the plates that use them, and says to tell the coach', async () => {
    renderAs('assistant', sheet([bacon, slab], [plate('Ada Example', ['Oven bacon']), plate('Bo Example', ['Oven bacon']), plate('Cy Example', [])]));
    const notice = (await screen.findByText('Not every container can be filled')).closest('[role="note"]') as HTMLElement;
    const items = within(notice).getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toEqual([
      'Oven bacon: 6 portions short (1 of its 2 trays thrown away). 2 plate labels below use it, marked “Short”.',
      'Chive egg slab: 1 portion short (the one tray set does not cover its plates). No plate label of this prep day uses it.',
    ]);
    expect(notice.textContent).toContain('tell the coach');
    expect(within(notice).queryByRole('link')).toBeNull();
    // Two labels carry the on-screen mark; it is not printed.
    const marks = screen.getAllByText('⚠ Short: Oven bacon');
    expect(marks).toHaveLength(2);
    for (const m of marks) expect(m.className).toContain('no-print');
  });

  it('links the coach to the week board', async () => {
    renderAs('coach', sheet([bacon], [plate('Ada Example', ['Oven bacon'])]));
    await screen.findByText('Not every container can be filled');
    expect(screen.getByRole('link', { name: 'week board' }).getAttribute('href')).toBe('/weeks/7');
  });

  it('says nothing when every tray is covered', async () => {
    renderAs('assistant', sheet([], [plate('Ada Example', [])]));
    await screen.findByLabelText('Sheet 1 of 1');
    expect(screen.queryByText('Not every container can be filled')).toBeNull();
    expect(screen.queryByText(/Short:/)).toBeNull();
  });
});

describe('plate labels with an allergen on the client’s own list', () => {
  const marked = (title: string, onClientList: ContainerLabelDto['onClientList'], date = '2026-01-05') => ({
    ...plate(title, []),
    planned: { date, slot: 'breakfast' },
    subtitle: 'Feta slab wrap',
    allergens: ['milk', 'egg'] as ContainerLabelDto['allergens'],
    onClientList,
  });

  it('names them before printing, for the assistant: whose, which day, which plate, which allergen, and to ask the coach', async () => {
    renderAs('assistant', sheet([], [marked('Ada Example', ['milk']), marked('Bo Example', []), marked('Cy Example', ['milk', 'egg'], '2026-01-06')]));
    const notice = (await screen.findByText('2 plate labels mark an allergen on the client’s own list')).closest('[role="note"]') as HTMLElement;
    expect(within(notice).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'Ada Example, Mon, Jan 5 breakfast: Feta slab wrap (Milk)',
      'Cy Example, Tue, Jan 6 breakfast: Feta slab wrap (Milk, Egg)',
    ]);
    expect(notice.textContent).toContain('Each is marked on its label; pack them with care, apart from the rest. If one looks wrong, ask the coach before packing it.');
    expect(notice.parentElement!.className).toContain('no-print');
    expect(screen.getAllByText(/^⚠ On the client’s allergen list:/)).toHaveLength(2);
  });

  it('leads the coach to the week board, and says nothing when no label has one', async () => {
    renderAs('coach', sheet([], [marked('Ada Example', ['milk'])]));
    const one = (await screen.findByText('1 plate label marks an allergen on the client’s own list')).closest('[role="note"]') as HTMLElement;
    expect(one.textContent).toContain('It is marked on its label; pack it with care, apart from the rest.');
    expect(screen.getByRole('link', { name: 'week board' }).getAttribute('href')).toBe('/weeks/7');
    cleanup();
    renderAs('coach', sheet([], [marked('Ada Example', [])]));
    await screen.findByLabelText('Sheet 1 of 1');
    expect(screen.queryByText(/on the client’s own list/)).toBeNull();
  });
});

describe('printing part of the labels', () => {
  const four = [plate('Ada Example', [], 1), plate('Bo Example', [], 2), plate('Ada Example', [], 1), { ...plate('Egg slab', [], 1), kind: 'spare' as const, clientId: null }];

  it('starts at the first unused label of a sheet used before: the places before it stay blank on paper', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(sheet([], four))));
    renderAtRoute(<LabelsPage />, '/weeks/:weekId/labels', '/weeks/7/labels?start=8', signedIn({ role: 'assistant' }));
    // 4 labels from place 8 of a 2 × 5 Letter sheet: places 8–10 of the first sheet, then one on a second.
    expect(await screen.findByText(/^4 labels on 2 sheets, the first from label 8, prep day .*\. Labels 2–10 of the last sheet stay unused: start there next time\.$/)).toBeTruthy();
    expect((screen.getByLabelText('Start at label') as HTMLSelectElement).selectedOptions[0].textContent).toBe('8 (row 4, right)');
    const used = screen.getAllByText('Already used');
    expect(used).toHaveLength(7);
    for (const u of used) expect(u.className).toContain('no-print');
    expect(within(screen.getByLabelText('Sheet 1 of 2')).getAllByText(/^(Ada Example|Bo Example|Egg slab)$/)).toHaveLength(3);
    expect(within(screen.getByLabelText('Sheet 2 of 2')).getAllByText(/^(Ada Example|Bo Example|Egg slab)$/)).toHaveLength(1);
  });

  it('prints one client’s labels again: their plates only, no spare portions', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(sheet([], four))));
    renderAtRoute(<LabelsPage />, '/weeks/:weekId/labels', '/weeks/7/labels', signedIn({ role: 'assistant' }));
    const whose = (await screen.findByLabelText('Whose labels')) as HTMLSelectElement;
    expect(Array.from(whose.options).map((o) => o.textContent)).toEqual(["Everyone's", 'Ada Example', 'Bo Example']);
    expect(screen.getByText(/^4 labels on 1 sheet/)).toBeTruthy();
    fireEvent.change(whose, { target: { value: '1' } });
    expect(await screen.findByText(/^2 labels on 1 sheet/)).toBeTruthy();
    const sheets = screen.getByRole('region', { name: 'Label sheets at real size' });
    expect(within(sheets).getAllByText('Ada Example')).toHaveLength(2);
    expect(within(sheets).queryByText('Bo Example')).toBeNull();
    expect(within(sheets).queryByText('Egg slab')).toBeNull();
    expect(screen.queryByLabelText('Label spare portions too')).toBeNull();
  });

  it('an address naming a client without a label this prep day shows everyone’s', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(sheet([], four))));
    renderAtRoute(<LabelsPage />, '/weeks/:weekId/labels', '/weeks/7/labels?client=999', signedIn({ role: 'assistant' }));
    expect(await screen.findByText(/^4 labels on 1 sheet/)).toBeTruthy();
    expect((screen.getByLabelText('Whose labels') as HTMLSelectElement).value).toBe('');
  });

  it('one client’s labels: the shortage notice counts their plates only, and is gone when none of theirs is short', async () => {
    const labels = [plate('Ada Example', ['Oven bacon'], 1), plate('Ada Example', ['Oven bacon'], 1), plate('Bo Example', [], 2), plate('Cy Example', ['Oven bacon'], 3)];
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(sheet([{ ...bacon, plateLabels: 3 }], labels))));
    renderAtRoute(<LabelsPage />, '/weeks/:weekId/labels', '/weeks/7/labels?client=1', signedIn({ role: 'assistant' }));
    expect(await screen.findByText(/2 plate labels below use it/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Whose labels'), { target: { value: '2' } });
    expect(await screen.findByText(/^1 label on 1 sheet/)).toBeTruthy();
    expect(screen.queryByText('Not every container can be filled')).toBeNull();
  });

  it('says which labels of the last sheet stay unused, to start there next time (none when the sheet is full)', async () => {
    const nine = Array.from({ length: 9 }, (_, i) => plate(`Client ${i + 1}`, [], i + 1));
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(sheet([], nine))));
    const { unmount } = renderAtRoute(<LabelsPage />, '/weeks/:weekId/labels', '/weeks/7/labels', signedIn({ role: 'assistant' }));
    expect(await screen.findByText(/^9 labels on 1 sheet, .* Label 10 of the last sheet stays unused: start there next time\.$/)).toBeTruthy();
    unmount();
    renderAtRoute(<LabelsPage />, '/weeks/:weekId/labels', '/weeks/7/labels?start=2', signedIn({ role: 'assistant' }));
    expect(await screen.findByText(/^9 labels on 1 sheet, the first from label 2, prep day [^.]*\.$/)).toBeTruthy();
  });
});
