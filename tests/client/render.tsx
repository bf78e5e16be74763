import type { ReactElement } from 'react';
import { render } from '@testing-library/react';
import { vi } from 'vitest';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import type { MeDto } from '@shared/schemas/auth.schema';
import { meQuery } from '@/features/auth/api/auth.queries';

/** A fetch answer with a JSON body (a problem when the status is 400 or more). */
export const jsonResponse = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': status >= 400 ? 'application/problem+json' : 'application/json' } });

/** The 409 an edit from a stale version gets: someone else's save is `current` (server/http/errors.ts StaleEdit). */
export const staleResponse = (current: unknown) =>
  jsonResponse({ status: 409, code: 'stale_version', title: 'Conflict', detail: 'Someone else changed this since you opened it', current }, 409);

/**
 * Stubs fetch with one record the way the API keeps it: `GET url` answers `state.current`; a PUT or PATCH is kept in
 * `writes` and refused (409 with the current record) unless it sends the current version, else `write` makes the new
 * record (its version one up). A test changes `state.current` to play someone else's save. Any other URL is answered
 * by `other`, or a 500 (the page's side cards are not what such a test checks).
 */
export function stubVersionedRecord<T extends { version: number }>(
  url: string,
  start: T,
  write: (current: T, body: Record<string, unknown>) => Omit<T, 'version'>,
  other: (url: string) => Response | undefined | Promise<Response | undefined> = () => undefined,
) {
  const state = { current: start };
  const writes: Record<string, unknown>[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (at: string, init?: RequestInit) => {
      if (init?.method === 'PUT' || init?.method === 'PATCH') {
        const body = JSON.parse(String(init.body)) as Record<string, unknown>;
        writes.push(body);
        if (body.version !== state.current.version) return staleResponse(state.current);
        state.current = { ...write(state.current, body), version: state.current.version + 1 } as T;
        return jsonResponse(state.current);
      }
      if (at === url) return jsonResponse(state.current);
      return (await other(at)) ?? jsonResponse({ title: 'Not in this test' }, 500);
    }),
  );
  return { state, writes };
}

/** A query client for one test: no retries, so an error shows at once. */
export const testQueryClient = () => new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });

/** Renders a page part as the app does: inside a router and a query client. */
export function renderInApp(ui: ReactElement, qc: QueryClient = testQueryClient()) {
  // A data router, as the app's: a page that guards unsaved typing (useBlocker) needs one.
  const router = createMemoryRouter([{ path: '*', element: <QueryClientProvider client={qc}>{ui}</QueryClientProvider> }]);
  return render(<RouterProvider router={router} />);
}

/** An invented signed-in person (a coach in US measures unless told otherwise). */
export function signedIn(overrides: Partial<MeDto> = {}): MeDto {
  return {
    id: 1,
    email: 'coach@example.test',
    name: 'Ada Coach',
    role: 'coach',
    workspaceId: 1,
    workspaceName: 'Example Prep',
    workspaceIsDemo: false,
    clientId: null,
    unitSystem: 'us',
    dateOrder: 'month-day',
    clock: '24h',
    timeZone: null,
    staysSignedIn: true,
    tempUnit: 'F',
    ...overrides,
  };
}

/** A query client for one test with `me` already signed in (what the app shell guarantees its pages). */
export function queryClientFor(me: MeDto): QueryClient {
  const qc = testQueryClient();
  qc.setQueryData(meQuery().queryKey, me);
  return qc;
}

/**
 * Renders a page that reads its route's params: `element` under `path`, opened at `url`, signed in as `me`. The query
 * client comes back with it (`qc`), for a test that refreshes data under the page.
 */
export function renderAtRoute(element: ReactElement, path: string, url: string, me: MeDto = signedIn()) {
  const qc = queryClientFor(me);
  const router = createMemoryRouter(
    [
      { path, element: <QueryClientProvider client={qc}>{element}</QueryClientProvider> },
      // Any other page of the app: where a link or a navigation of the page leads.
      { path: '*', element: <p>Another page</p> },
    ],
    { initialEntries: [url] },
  );
  const result = render(<RouterProvider router={router} />);
  return { ...result, qc, router };
}
