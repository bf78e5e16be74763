import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as ClientsPage } from '@/app/routes/clients/clients.route';
import { jsonResponse, renderInApp } from './render';

// Eight invented clients (only the fields the list reads); one allergic to egg, one who dislikes olives.
const client = (id: number, name: string, allergens: string[] = [], dislikes: string[] = []) => ({
  id,
  name,
  householdMultiplier: '1',
  targets: { targetKcal: 1800, netCarbCapG: 30, proteinG: 90, fatG: 140 },
  allergens,
  dislikes,
  account: null,
  archivedAt: null as string | null,
});
const clients = [
  client(1, 'Tomás Ferreira'),
  client(2, 'Ana Ruiz', ['egg']),
  client(3, 'Marcus Bell', [], ['olives']),
  client(4, 'Dana Whit'),
  client(5, 'Lena Ok'),
  client(6, 'Mae Cas'),
  client(7, 'Hugo Br'),
  client(8, 'Ingrid So'),
];

const rows = () => screen.getAllByRole('row').slice(1).map((r) => r.querySelector('a')?.textContent);

describe('the clients list', () => {
  it('finds clients by name (without accents), allergen or dislike once the list is long', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(clients)));
    renderInApp(<ClientsPage />);
    await waitFor(() => expect(rows()).toHaveLength(8));
    const box = screen.getByLabelText('Find a client');
    fireEvent.change(box, { target: { value: 'tomas' } });
    expect(rows()).toEqual(['Tomás Ferreira']);
    expect(screen.getByText('1 of 8 shown')).toBeTruthy();
    fireEvent.change(box, { target: { value: 'Egg' } });
    expect(rows()).toEqual(['Ana Ruiz']);
    fireEvent.change(box, { target: { value: 'olives' } });
    expect(rows()).toEqual(['Marcus Bell']);
    fireEvent.change(box, { target: { value: 'nobody' } });
    expect(screen.getByText('No client matches “nobody”.')).toBeTruthy();
  });

  it('has no filter box for a short list', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(clients.slice(0, 3))));
    renderInApp(<ClientsPage />);
    await waitFor(() => expect(rows()).toHaveLength(3));
    expect(screen.queryByLabelText('Find a client')).toBeNull();
  });

  it('leaves archived clients out until the coach asks for them, marked', async () => {
    const list = [...clients.slice(0, 3), { ...client(9, 'Olga Paused'), archivedAt: '2026-11-20T09:00:00.000Z' }];
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(list)));
    renderInApp(<ClientsPage />);
    await waitFor(() => expect(rows()).toHaveLength(3));
    expect(rows()).not.toContain('Olga Paused');
    fireEvent.click(screen.getByLabelText('Show archived clients (1)'));
    expect(rows()).toContain('Olga Paused');
    const row = screen.getAllByRole('row').find((r) => r.textContent?.includes('Olga Paused'))!;
    expect(row.textContent).toContain('Archived');
  });

  it('says so when every client is archived', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse([{ ...client(9, 'Olga Paused'), archivedAt: '2026-11-20T09:00:00.000Z' }])));
    renderInApp(<ClientsPage />);
    await waitFor(() => expect(screen.getByText('Every client is archived. Show them above, or add a new client.')).toBeTruthy());
    expect(screen.queryAllByRole('row')).toHaveLength(0);
  });
});
