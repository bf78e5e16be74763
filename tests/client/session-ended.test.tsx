import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { QueryClientProvider, useMutation, useQuery, type QueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { api, onUnauthorized } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { useLivePreview } from '@/lib/use-live-preview';
import { ApiError } from '@/lib/problem';
import { meQuery } from '@/features/auth/api/auth.queries';
import { useMe } from '@/features/auth/hooks/use-me';
import { followUnauthorized, SessionGate } from '@/features/auth/components/session-ended';
import { jsonResponse, queryClientFor, signedIn } from './render';

// An invented coach in workspace 1 ("Example Prep"), typing a note on a page whose save meets an ended session.
const coach = signedIn();

function NotePage() {
  const me = useMe();
  const [note, setNote] = useState('');
  const saved = useQuery({ queryKey: ['note'], queryFn: () => api.get<{ note: string }>('/note') });
  const save = useMutation({ mutationFn: () => api.put<{ note: string }>('/note', { note }), meta: { silent: true } });
  return (
    <main>
      <p>Signed in: {me.name}</p>
      <p>Saved note: {saved.data?.note ?? (saved.isError ? 'could not read' : '…')}</p>
      <label>
        Note
        <input value={note} onChange={(e) => setNote(e.target.value)} />
      </label>
      <button onClick={() => save.mutate()}>Save</button>
      {save.isSuccess && <p>Saved.</p>}
    </main>
  );
}

let session = true;
let noteOnServer = '';
const logins: unknown[] = [];
const toSignIn = vi.fn();
const elsewhere = vi.fn();
let stop = () => {};

/** A page as the app shows it: under the session gate, with 401s followed as the app's providers follow them. */
function show(page = <NotePage />, qc: QueryClient = queryClientFor(coach)) {
  stop = onUnauthorized(followUnauthorized(qc, toSignIn));
  render(
    <QueryClientProvider client={qc}>
      <SessionGate signInElsewhere={elsewhere}>{page}</SessionGate>
    </QueryClientProvider>,
  );
  return qc;
}

beforeEach(() => {
  session = true;
  noteOnServer = 'Lid on';
  logins.length = 0;
  toSignIn.mockReset();
  elsewhere.mockReset();
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      const body = init?.body ? JSON.parse(String(init.body)) : undefined;
      if (url === '/api/auth/login') {
        logins.push(body);
        if (body.password !== 'right-password') return jsonResponse({ status: 401, code: 'bad_credentials', title: 'Wrong e-mail or password' }, 401);
        session = true;
        return jsonResponse(signedIn({ workspaceId: 2, workspaceName: 'Other Prep' }));
      }
      if (url === '/api/auth/workspace') return jsonResponse(signedIn({ workspaceId: body.workspaceId }));
      if (!session) return jsonResponse({ status: 401, code: 'unauthorized', title: 'Not signed in' }, 401);
      if (url === '/api/auth/me') return jsonResponse(coach);
      if (url === '/api/note' && init?.method === 'PUT') noteOnServer = body.note;
      if (url === '/api/preview') return jsonResponse({ kcal: 246 });
      return jsonResponse({ note: noteOnServer });
    }),
  );
});
afterEach(() => stop());

describe('a session that ends under an open page', () => {
  it('keeps the page and its typing under a "Signed out" dialog, signs the same person in again there, and the save goes through', async () => {
    show();
    await screen.findByText('Saved note: Lid on');
    fireEvent.change(screen.getByLabelText('Note'), { target: { value: 'Moved to the walk-in at 10:05' } });
    session = false; // signed out on another device
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));

    const dialog = await screen.findByRole('dialog', { name: 'Signed out' });
    expect(dialog.textContent).toContain('This page stays as it is, with anything you typed.');
    expect(dialog.textContent).toContain('Signing in as coach@example.test');
    // Behind it, the page is still there with what was typed, and takes no input while the dialog shows.
    expect((screen.getByLabelText('Note') as HTMLInputElement).value).toBe('Moved to the walk-in at 10:05');
    expect(screen.getByText('Signed in: Ada Coach').closest('[inert]')).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByLabelText('Password'));
    // The page's other reads are refused too (here, one more): still the dialog, never the sign-in page.
    await expect(api.get('/note')).rejects.toThrow();
    expect(screen.getAllByRole('dialog')).toHaveLength(1);
    expect(toSignIn).not.toHaveBeenCalled();

    // A wrong password says so in the dialog.
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'wrong' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in and carry on' }));
    expect(await screen.findByText('That password does not match this account.')).toBeTruthy();

    // The right one: signed in as the same person, back in the page's workspace (login chose another), dialog gone.
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'right-password' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in and carry on' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    // Kept signed in as the ended session was.
    expect(logins).toEqual([
      { email: 'coach@example.test', password: 'wrong', staySignedIn: true },
      { email: 'coach@example.test', password: 'right-password', staySignedIn: true },
    ]);
    const calls = vi.mocked(globalThis.fetch).mock.calls.map(([url, init]) => `${init?.method ?? 'GET'} ${url}`);
    expect(calls).toContain('PUT /api/auth/workspace');
    expect(screen.getByText('Signed in: Ada Coach').closest('[inert]')).toBeNull();
    expect((screen.getByLabelText('Note') as HTMLInputElement).value).toBe('Moved to the walk-in at 10:05');
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    await screen.findByText('Saved.');
    expect(noteOnServer).toBe('Moved to the walk-in at 10:05');
  });

  it('shows the dialog when the signed-in check itself finds the session gone (the page read again on focus)', async () => {
    const qc = show();
    await screen.findByText('Saved note: Lid on');
    session = false;
    await act(() => qc.refetchQueries({ queryKey: meQuery().queryKey }));
    expect(await screen.findByRole('dialog', { name: 'Signed out' })).toBeTruthy();
    // The page stays (its person is still the one who was signed in), not an error.
    expect(screen.getByText('Signed in: Ada Coach')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Sign in as someone else' }));
    expect(elsewhere).toHaveBeenCalledTimes(1);
  });

  it('still shows the dialog after a sign-in on this page cleared the cached reads (as the sign-in page does)', async () => {
    const qc = show();
    await screen.findByText('Saved note: Lid on');
    act(() => {
      qc.clear();
      qc.setQueryData(meQuery().queryKey, coach);
    });
    await screen.findByText('Saved note: Lid on');
    session = false;
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByRole('dialog', { name: 'Signed out' })).toBeTruthy();
  });

  it('on a shared computer hides the page meanwhile, and signs in again as it was: not kept signed in', async () => {
    show(<NotePage />, queryClientFor(signedIn({ staysSignedIn: false })));
    await screen.findByText('Saved note: Lid on');
    fireEvent.change(screen.getByLabelText('Note'), { target: { value: 'Walk-in at 10:05' } });
    session = false;
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    const dialog = await screen.findByRole('dialog', { name: 'Signed out' });
    // The page is hidden behind it (the next person at a shared computer sees none of it), its typing kept.
    expect(dialog.textContent).toContain('This page stays as it is, with anything you typed, hidden until you sign in again');
    const page = screen.getByText('Signed in: Ada Coach').closest('[inert]')!;
    expect(page.className).toContain('invisible');
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'right-password' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in and carry on' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(logins).toEqual([{ email: 'coach@example.test', password: 'right-password', staySignedIn: false }]);
    expect(screen.getByText('Signed in: Ada Coach').closest('.invisible')).toBeNull();
    expect((screen.getByLabelText('Note') as HTMLInputElement).value).toBe('Walk-in at 10:05');
  });

  it('asks for the password before sending anything', async () => {
    show();
    await screen.findByText('Saved note: Lid on');
    session = false;
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Sign in and carry on' }));
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(logins).toEqual([]);
  });

  it('sends a page opened with nobody signed in to the sign-in page, as before', async () => {
    const qc = queryClientFor(coach);
    qc.setQueryData(meQuery().queryKey, null);
    stop = onUnauthorized(followUnauthorized(qc, toSignIn));
    session = false;
    await expect(api.get('/note')).rejects.toThrow();
    expect(toSignIn).toHaveBeenCalledTimes(1);
  });
});

function PreviewPage() {
  useMe();
  const preview = useMutation({ mutationFn: (input: { grams: number }) => api.post<{ kcal: number }>('/preview', input), meta: { silent: true, readOnly: true } });
  const input = useMemo(() => ({ grams: 100 }), []);
  useLivePreview(input, preview, 10);
  return <p>{preview.data ? `${preview.data.kcal} kcal` : preview.isError ? 'The numbers cannot be worked out yet' : '…'}</p>;
}

describe('a live preview refused because the session ended', () => {
  it('is sent again once the person signs in again, though nothing in the form changed', async () => {
    session = false;
    show(<PreviewPage />);
    await screen.findByRole('dialog', { name: 'Signed out' });
    expect(screen.getByText('The numbers cannot be worked out yet')).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'right-password' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in and carry on' }));
    expect(await screen.findByText('246 kcal')).toBeTruthy();
  });
});

describe('a form whose save meets an ended session', () => {
  it('keeps no error of its own (the dialog says it), while a wrong password on the sign-in page still says so', () => {
    const setError = vi.fn();
    const ended = new ApiError({ type: 'about:blank', title: 'Unauthorized', status: 401, code: 'unauthorized', detail: 'Sign in to continue' });
    const wrong = new ApiError({ type: 'about:blank', title: 'Unauthorized', status: 401, code: 'bad_credentials', detail: 'Wrong e-mail or password' });
    expect(applyServerErrors(ended, setError)).toBeNull();
    expect(applyServerErrors(wrong, setError)).toBe('Wrong e-mail or password');
    expect(setError).not.toHaveBeenCalled();
  });
});
