import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { jsonResponse, signedIn, testQueryClient } from './render';
import { RouterProvider } from 'react-router-dom';
import { createRouter } from '@/app/router';

/** The whole app's router, with its own query client, at the browser's address. */
function renderApp() {
  const qc = testQueryClient();
  render(
    <QueryClientProvider client={qc}>
      <RouterProvider router={createRouter(qc)} />
    </QueryClientProvider>,
  );
}

describe('app router', () => {
  it('shows a loading page while the first page and the signed-in check load, without React Router’s missing-fallback warning', async () => {
    let answer: (r: Response) => void = () => {};
    vi.stubGlobal('fetch', vi.fn(() => new Promise<Response>((resolve) => (answer = resolve))));
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
    window.history.pushState({}, '', '/');
    renderApp();
    expect(await screen.findByRole('status', { name: 'Loading page' })).toBeTruthy();
    expect(warn.mock.calls.map((c) => String(c[0])).filter((m) => /HydrateFallback/i.test(m))).toEqual([]);
    answer(new Response(JSON.stringify({ status: 401, title: 'Not signed in' }), { status: 401, headers: { 'content-type': 'application/problem+json' } }));
  });

  it('signing out shows nothing of an error while the sign-in page loads (after a reload its code is not there yet)', async () => {
    let signedOut = false;
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string) => {
        if (url.endsWith('/auth/logout')) {
          signedOut = true;
          return new Response(null, { status: 204 });
        }
        if (url.endsWith('/auth/me')) return signedOut ? jsonResponse({ title: 'Not signed in' }, 401) : jsonResponse(signedIn({ role: 'client', clientId: 3 }));
        if (url.includes('/weeks/mine')) return jsonResponse(null);
        return jsonResponse([]);
      }),
    );
    window.history.pushState({}, '', '/my-plates');
    renderApp();
    expect(await screen.findByRole('heading', { name: 'No plan yet' })).toBeTruthy();
    const errors: string[] = [];
    const watch = new MutationObserver(() => {
      if (document.body.textContent?.includes('Could not load this')) errors.push(document.body.textContent);
    });
    watch.observe(document.body, { subtree: true, childList: true, characterData: true });
    fireEvent.click(screen.getAllByRole('button', { name: 'Sign out' })[0]);
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeTruthy();
    watch.disconnect();
    expect(errors).toEqual([]);
  });
});
