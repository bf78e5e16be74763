import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { MyWorkspaceDto } from '@shared/schemas/auth.schema';
import { WorkspaceSwitch } from '@/features/auth/components/workspace-switch';
import { jsonResponse, renderInApp } from './render';

// Invented workspaces of one kitchen assistant who works for two coaches.
const both: MyWorkspaceDto[] = [
  { workspaceId: 3, name: 'Birch Lane Meals', role: 'assistant', isDemo: false, current: false },
  { workspaceId: 1, name: 'Oat & Ember Prep', role: 'assistant', isDemo: false, current: true },
];

afterEach(() => vi.unstubAllGlobals());

describe('the workspace switch', () => {
  it('shows only the name for someone in one workspace', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse([both[1]])));
    renderInApp(<WorkspaceSwitch current="Oat & Ember Prep" />);
    expect(await screen.findByText('Oat & Ember Prep')).toBeTruthy();
    expect(screen.queryByLabelText('Workspace')).toBeNull();
  });

  it('lets someone in two choose, sends the choice, then reloads at home', async () => {
    const calls: string[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        calls.push(`${init?.method ?? 'GET'} ${url}${init?.body ? ` ${String(init.body)}` : ''}`);
        return init?.method === 'PUT' ? jsonResponse({ workspaceId: 3 }) : jsonResponse(both);
      }),
    );
    const reload = vi.fn();
    renderInApp(<WorkspaceSwitch current="Oat & Ember Prep" reload={reload} />);
    const select = (await screen.findByLabelText('Workspace')) as HTMLSelectElement;
    expect([...select.options].map((o) => o.text)).toEqual(['Birch Lane Meals (kitchen assistant)', 'Oat & Ember Prep (kitchen assistant)']);
    expect(select.value).toBe('1');
    fireEvent.change(select, { target: { value: '3' } });
    await waitFor(() => expect(reload).toHaveBeenCalled());
    expect(calls).toEqual(['GET /api/auth/workspaces', 'PUT /api/auth/workspace {"workspaceId":3}']);
  });
});
