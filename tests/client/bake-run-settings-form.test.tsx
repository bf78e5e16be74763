import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import type { OvenDto, WeekBakeRunDto } from '@shared/schemas/bake-setup.schema';
import { BakeRunSettingsForm } from '@/features/bake-runs/components/bake-run-settings-form';
import { ApiError } from '@/lib/problem';

// An invented week's run (only the fields the settings form reads): one tray, two ovens.
const ovens = [{ id: 1, name: 'Left' }, { id: 2, name: 'Right' }] as OvenDto[];
const runAt = (start: string, version: number | null, cooks = 2) =>
  ({
    prepDate: '2026-01-04',
    settings: { prepDate: '2026-01-04', start, cooks, handsOnMinutes: { '9': 15 }, ovenIds: [], version },
    trays: [{ trayId: 9, name: 'Egg slab', trayCount: 2, handsOnMinutes: 15 }],
  }) as unknown as WeekBakeRunDto;

const field = (label: string) => screen.getByLabelText(label) as HTMLInputElement;

function renderForm(dto: WeekBakeRunDto, over: { error?: unknown } = {}) {
  const onSave = vi.fn();
  const onReload = vi.fn();
  const view = render(<BakeRunSettingsForm dto={dto} allOvens={ovens} saving={false} error={over.error ?? null} onSave={onSave} onReload={onReload} />);
  const again = (next: WeekBakeRunDto, error: unknown = null) =>
    view.rerender(<BakeRunSettingsForm dto={next} allOvens={ovens} saving={false} error={error} onSave={onSave} onReload={onReload} />);
  return { onSave, onReload, again };
}

describe('the bake-run settings form when someone else changes the run', () => {
  it('follows their change when nothing was typed', () => {
    const { again } = renderForm(runAt('2026-01-04T08:00', 3));
    // The assistant moved the start on prep day; the page's query brought version 4.
    again(runAt('2026-01-04T08:40', 4));
    expect(field('Start').value).toBe('2026-01-04T08:40');
    expect(screen.queryByText('These settings were changed meanwhile')).toBeNull();
  });

  it('keeps edits in progress, says so, and saves them against the version they started from', () => {
    const { again, onSave, onReload } = renderForm(runAt('2026-01-04T08:00', 3));
    fireEvent.change(field('Cooks'), { target: { value: '3' } });
    again(runAt('2026-01-04T08:40', 4));
    expect(field('Cooks').value).toBe('3');
    expect(field('Start').value).toBe('2026-01-04T08:00');
    expect(screen.getByText('These settings were changed meanwhile')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Save and plan' }));
    // Version 3: the server answers 409 instead of overwriting the moved start.
    expect(onSave).toHaveBeenCalledWith(expect.objectContaining({ cooks: 3, start: '2026-01-04T08:00', version: 3 }));
    fireEvent.click(screen.getByRole('button', { name: 'Load the saved settings' }));
    expect(onReload).toHaveBeenCalled();
    expect(field('Start').value).toBe('2026-01-04T08:40');
    expect(field('Cooks').value).toBe('2');
  });

  it('takes in its own save without a notice', () => {
    const { again, onSave } = renderForm(runAt('2026-01-04T08:00', 3));
    fireEvent.change(field('Cooks'), { target: { value: '3' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save and plan' }));
    expect(onSave).toHaveBeenCalledWith(expect.objectContaining({ cooks: 3, version: 3 }));
    again(runAt('2026-01-04T08:00', 4, 3));
    expect(screen.queryByText('These settings were changed meanwhile')).toBeNull();
    expect(field('Cooks').value).toBe('3');
    // The next save starts from version 4.
    fireEvent.click(screen.getByRole('button', { name: 'Save and plan' }));
    expect(onSave).toHaveBeenLastCalledWith(expect.objectContaining({ version: 4 }));
  });

  it('after a refused save (409), a newer version does not replace what was typed', () => {
    const stale = new ApiError({ type: 'about:blank', title: 'Conflict', status: 409, code: 'stale_version', detail: 'Someone changed this run meanwhile' });
    const { again } = renderForm(runAt('2026-01-04T08:00', 3));
    fireEvent.change(field('Cooks'), { target: { value: '4' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save and plan' }));
    again(runAt('2026-01-04T08:00', 3), stale);
    again(runAt('2026-01-04T08:40', 4), stale);
    expect(field('Cooks').value).toBe('4');
    expect(screen.getByText('These settings were changed meanwhile')).toBeTruthy();
  });
});
