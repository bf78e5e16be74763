import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as TrayPage } from '@/app/routes/trays/tray-detail.route';
import { LEAVE_QUESTION, useUnsavedGuard, type UnsavedGuard } from '@/lib/use-unsaved-guard';
import { renderAtRoute, stubVersionedRecord } from './render';
import { eggSlabTray } from './tray-fixtures';

const tray = eggSlabTray;

afterEach(() => vi.unstubAllGlobals());

const openTray = () => {
  stubVersionedRecord('/api/trays/12', tray(), (current, body) => ({ ...current, name: String(body.name) }));
  return renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
};

/**
 * A bare page holding the guard, saying `text`, opened at `path` and holding typing; the person answers "no" to any
 * question (`confirm`). `guard()` is the guard it holds.
 */
async function openGuardedPage(text: string, path: string) {
  const confirm = vi.fn(() => false);
  vi.stubGlobal('confirm', confirm);
  let held: UnsavedGuard | null = null;
  function Page() {
    held = useUnsavedGuard();
    return <p>{text}</p>;
  }
  const { router } = renderAtRoute(<Page />, path, path);
  await screen.findByText(text);
  const guard = () => held!;
  act(() => guard().onDirtyChange(true));
  return { router, guard, confirm };
}

describe('leaving a page that holds typing', () => {
  it('asks first; "Cancel" stays with the typing, "OK" leaves', async () => {
    const confirm = vi.fn(() => false);
    vi.stubGlobal('confirm', confirm);
    const { router } = openTray();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Typed, not saved' } });
    await screen.findByText('Unsaved changes');
    await act(() => router.navigate('/trays'));
    expect(confirm).toHaveBeenCalledWith(LEAVE_QUESTION);
    expect(router.state.location.pathname).toBe('/trays/12');
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Typed, not saved');
    confirm.mockReturnValue(true);
    await act(() => router.navigate('/trays'));
    await screen.findByText('Another page');
    expect(router.state.location.pathname).toBe('/trays');
  });

  it('leaves without asking when nothing is typed, or once the typing is saved', async () => {
    const confirm = vi.fn(() => false);
    vi.stubGlobal('confirm', confirm);
    const { router } = openTray();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Saved first' } });
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    await screen.findByText('Saved.');
    await waitFor(() => expect(screen.queryByText('Unsaved changes')).toBeNull());
    await act(() => router.navigate('/trays'));
    await screen.findByText('Another page');
    expect(confirm).not.toHaveBeenCalled();
  });

  it('has the browser ask before the tab is closed or reloaded, only while typing is held', async () => {
    openTray();
    const before = () => {
      const e = new Event('beforeunload', { cancelable: true });
      window.dispatchEvent(e);
      return e.defaultPrevented;
    };
    await screen.findByLabelText('Name');
    expect(before()).toBe(false);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Typed' } });
    await waitFor(() => expect(before()).toBe(true));
  });

  it('keeps the typing while the recipe card is looked at', async () => {
    openTray();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Typed, then a look at the card' } });
    fireEvent.click(screen.getByRole('tab', { name: 'Recipe card' }));
    fireEvent.click(screen.getByRole('tab', { name: 'Edit' }));
    // Before, the editor was unmounted by the card view: everything typed was gone.
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Typed, then a look at the card');
  });

  it('lets the page’s own navigation after a save go unasked (allow), and only that one', async () => {
    const { router, guard, confirm } = await openGuardedPage('A form holding typing', '/things/new');
    // Saved: the page goes to what it made (as a create does) without asking.
    act(() => guard().allow());
    await act(() => router.navigate('/things/7'));
    expect(router.state.location.pathname).toBe('/things/7');
    expect(confirm).not.toHaveBeenCalled();
  });

  it('lets a move within the same page go unasked (another query of the same path)', async () => {
    const { router, confirm } = await openGuardedPage('A list with a filter', '/things');
    await act(() => router.navigate('/things?page=2'));
    expect(router.state.location.search).toBe('?page=2');
    expect(confirm).not.toHaveBeenCalled();
    await act(() => router.navigate('/elsewhere'));
    expect(confirm).toHaveBeenCalledTimes(1);
    expect(router.state.location.pathname).toBe('/things');
  });
});
