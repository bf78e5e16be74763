import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { ScalePanel } from '@/features/trays/components/scale-panel';
import { eggSlabTray } from './tray-fixtures';
import { jsonResponse, renderInApp } from './render';

afterEach(() => vi.unstubAllGlobals());

const refuse = (errors: Record<string, string[]>) =>
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse({ status: 400, code: 'validation', title: 'Bad Request', detail: 'Invalid input', errors }, 400)));

describe('scaling a tray: every refusal is said', () => {
  it('a refusal of the amount shows on the amount box', async () => {
    refuse({ targetPortions: ['Use a whole number of portions'] });
    renderInApp(<ScalePanel tray={eggSlabTray()} system="us" />);
    fireEvent.change(screen.getByLabelText('Portions needed'), { target: { value: '2.5' } });
    fireEvent.click(screen.getByRole('button', { name: 'Scale' }));
    expect(await screen.findByText('Use a whole number of portions')).toBeTruthy();
    expect(screen.getByLabelText('Portions needed').getAttribute('aria-invalid')).toBe('true');
  });

  it('a refusal of the pan (no amount box then) is said under the form in its own words, not "Invalid input"', async () => {
    refuse({ 'pan.code': ['Choose one of the standard pans'] });
    renderInApp(<ScalePanel tray={eggSlabTray()} system="us" />);
    fireEvent.change(screen.getByLabelText('Scale by'), { target: { value: 'pan' } });
    fireEvent.click(screen.getByRole('button', { name: 'Scale' }));
    expect(await screen.findByText('Choose one of the standard pans')).toBeTruthy();
    expect(screen.queryByText('Invalid input')).toBeNull();
  });
});
