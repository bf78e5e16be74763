import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import type { ContainerLabelDto, LabelSheetDto, ShortTrayDto } from '@shared/schemas/shopping.schema';
import { Component as LabelsPage } from '@/app/routes/shopping/labels.route';
import { jsonResponse, renderAtRoute, signedIn } from './render';

// Invented labels of week 7, prep day Sun 4 Jan 2026: two plates that use a tray, one that does not.
const plate = (title: string, shortTrays: string[]): ContainerLabelDto => ({
  kind: 'plate',
  title,
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
    await screen.findByText('Ada Example');
    expect(screen.queryByText('Not every container can be filled')).toBeNull();
    expect(screen.queryByText(/Short:/)).toBeNull();
  });
});
