import { describe, expect, it, vi } from 'vitest';
import { render, screen } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { testQueryClient } from './render';
import { RouterProvider } from 'react-router-dom';
import { createRouter } from '@/app/router';

describe('app router', () => {
  it('shows a loading page while the first page and the signed-in check load, without React Router’s missing-fallback warning', async () => {
    let answer: (r: Response) => void = () => {};
    vi.stubGlobal('fetch', vi.fn(() => new Promise<Response>((resolve) => (answer = resolve))));
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
    window.history.pushState({}, '', '/');
    const qc = testQueryClient();
    render(
      <QueryClientProvider client={qc}>
        <RouterProvider router={createRouter(qc)} />
      </QueryClientProvider>,
    );
    expect(await screen.findByRole('status', { name: 'Loading page' })).toBeTruthy();
    expect(warn.mock.calls.map((c) => String(c[0])).filter((m) => /HydrateFallback/i.test(m))).toEqual([]);
    answer(new Response(JSON.stringify({ status: 401, title: 'Not signed in' }), { status: 401, headers: { 'content-type': 'application/problem+json' } }));
  });
});
