import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { TrayDto } from '@shared/schemas/trays.schema';
import { Component as TrayPage } from '@/app/routes/trays/tray-detail.route';
import { jsonResponse, renderAtRoute, stubVersionedRecord } from './render';
import { eggSlabTray } from './tray-fixtures';

// The tray archived, unless a test says otherwise.
const tray = (overrides: Partial<TrayDto> = {}): TrayDto => eggSlabTray({ archived: true, ...overrides });

afterEach(() => vi.unstubAllGlobals());

describe('the tray editor and saves made meanwhile', () => {
  const serve = (start: TrayDto) =>
    stubVersionedRecord('/api/trays/12', start, (current, body) =>
      tray({ name: String(body.name), archived: 'archived' in body ? Boolean(body.archived) : current.archived }),
    );

  it('keeps the typing and saves it on the restored version, with no word of anyone else', async () => {
    const { writes } = serve(tray());
    renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Spinach egg slab, less salt' } });
    fireEvent.click(screen.getByRole('button', { name: 'Restore' }));
    await screen.findByText('Restored.');
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    await waitFor(() => expect(writes).toHaveLength(2));
    await waitFor(() => expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Spinach egg slab, less salt'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    // The restore went from 3; the editor's save, begun on 3, goes on 4 (this coach's own restore).
    expect(writes.map((p) => [p.name, p.archived, p.version])).toEqual([
      ['Spinach egg slab', false, 3],
      ['Spinach egg slab, less salt', undefined, 4],
    ]);
  });

  it('still says so when someone else saved the tray meanwhile, and saves over theirs only when asked', async () => {
    const { state, writes } = serve(tray({ archived: false }));
    renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Mine' } });
    state.current = tray({ archived: false, name: 'Theirs', version: 4 });
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    expect(await screen.findByText('Someone else saved this tray while you were editing')).toBeTruthy();
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Mine');
    const keep = screen.getByRole('button', { name: 'Keep mine and save again' });
    keep.focus();
    fireEvent.click(keep);
    await waitFor(() => expect(writes).toHaveLength(2));
    expect(writes.map((p) => [p.name, p.version])).toEqual([
      ['Mine', 3],
      ['Mine', 4],
    ]);
    // The notice goes once the save is in; the keyboard goes on to the tray's first field.
    await waitFor(() => expect(screen.queryByText('Someone else saved this tray while you were editing')).toBeNull());
    await waitFor(() => expect(document.activeElement).toBe(screen.getByLabelText('Name')));
  });

  it('follows a newer version at once when nothing is typed', async () => {
    const { state } = serve(tray({ archived: false }));
    const { qc } = renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    await screen.findByLabelText('Name');
    state.current = tray({ archived: false, name: 'Theirs', tags: ['breakfast', 'egg-free'], version: 4 });
    await qc.invalidateQueries();
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Theirs'));
    // Every field shows theirs, the tags' text box too (it keeps its own text while typing).
    expect((screen.getByLabelText(/^Tags/) as HTMLInputElement).value).toBe('breakfast, egg-free');
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    expect(screen.queryByText('Unsaved changes')).toBeNull();
  });

  it('keeps the typing when a newer version arrives under it, says so, and never saves over theirs unasked', async () => {
    const { state, writes } = serve(tray({ archived: false }));
    const { qc } = renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Mine' } });
    state.current = tray({ archived: false, name: 'Theirs', version: 4 });
    await qc.invalidateQueries();
    expect(await screen.findByText('Someone else saved this tray (version 4) since you started typing')).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Theirs');
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Mine');
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    expect(await screen.findByText('Someone else saved this tray while you were editing')).toBeTruthy();
    // Sent from version 3, the one the typing started from: refused, theirs stands.
    expect(writes.map((p) => [p.name, p.version])).toEqual([['Mine', 3]]);
    fireEvent.click(screen.getByRole('button', { name: 'Reload their version' }));
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Theirs'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
  });

  it('drops the typing and loads theirs when asked, before any save', async () => {
    const { state, writes } = serve(tray({ archived: false }));
    const { qc } = renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Mine' } });
    state.current = tray({ archived: false, name: 'Theirs', version: 4 });
    await qc.invalidateQueries();
    fireEvent.click(await screen.findByRole('button', { name: 'Drop my typing and load theirs' }));
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Theirs'));
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Theirs, then mine' } });
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    await screen.findByText('Saved.');
    expect(writes.map((p) => [p.name, p.version])).toEqual([['Theirs, then mine', 4]]);
  });

  it('opens a duplicate with its own values and version, not the editor state of the tray it came from', async () => {
    const copy = tray({ id: 13, name: 'Spinach egg slab (copy)', archived: false, version: 1 });
    const { writes } = serve(tray({ archived: false }));
    const fetchOf = vi.mocked(fetch);
    const original = fetchOf.getMockImplementation()!;
    fetchOf.mockImplementation(async (at, init) => {
      if (String(at) === '/api/trays/12/duplicate') return jsonResponse(copy, 201);
      if (String(at) === '/api/trays/13') return init?.method === 'PUT' ? jsonResponse({ ...copy, name: 'Copy renamed', version: 2 }) : jsonResponse(copy);
      return original(at as string, init);
    });
    renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    await screen.findByLabelText('Name');
    fireEvent.click(screen.getByRole('button', { name: 'Duplicate' }));
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Spinach egg slab (copy)'));
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Copy renamed' } });
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    await screen.findByText('Saved.');
    const put = fetchOf.mock.calls.find(([at, init]) => String(at) === '/api/trays/13' && init?.method === 'PUT');
    expect(JSON.parse(String(put?.[1]?.body))).toMatchObject({ name: 'Copy renamed', version: 1 });
    expect(writes).toHaveLength(0);
  });

  it('says why a restore did nothing when someone else changed the tray meanwhile, and shows their version', async () => {
    const { state, writes } = serve(tray());
    renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    await screen.findByLabelText('Name');
    state.current = tray({ name: 'Theirs', version: 4 });
    fireEvent.click(screen.getByRole('button', { name: 'Restore' }));
    expect(
      await screen.findByText('Not restored: someone else changed this tray meanwhile, and the page now shows their version. Try again if you still mean to.'),
    ).toBeTruthy();
    await waitFor(() => expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Theirs'));
    // Nothing was typed: the editor shows theirs too, with no stale notice.
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Theirs'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    expect(writes.map((p) => [p.archived, p.version])).toEqual([[false, 3]]);
  });
});
