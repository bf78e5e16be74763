import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as SignIn } from '@/app/routes/auth/sign-in.route';
import { Component as Join } from '@/app/routes/auth/accept-invite.route';
import { jsonResponse, renderInApp, signedIn } from './render';

// The sign-in page with an invented coach's e-mail; the API answers every sign-in.
afterEach(() => vi.unstubAllGlobals());

function signInWith(untick: boolean) {
  const bodies: Record<string, unknown>[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      if (url === '/api/auth/login') bodies.push(JSON.parse(String(init?.body)));
      return jsonResponse(signedIn());
    }),
  );
  renderInApp(<SignIn />);
  const keep = screen.getByRole('checkbox', { name: 'Keep me signed in on this device' }) as HTMLInputElement;
  fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'coach@example.test' } });
  fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'a-long-password' } });
  if (untick) fireEvent.click(keep);
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
  return { bodies, keep };
}

describe('"Keep me signed in" at sign-in', () => {
  it('is ticked unless unticked, and says what unticking does (read out with the box)', async () => {
    const { bodies, keep } = signInWith(false);
    expect(keep.checked).toBe(true);
    const hint = document.getElementById(keep.getAttribute('aria-describedby')!);
    expect(hint?.textContent).toBe(
      'Untick on a shared or kitchen computer: you are signed out when the browser closes (or after 12 hours unused), and your plans and lists are not kept on it for use offline.',
    );
    await waitFor(() => expect(bodies).toEqual([{ email: 'coach@example.test', password: 'a-long-password', staySignedIn: true }]));
  });

  it('unticked, asks for a sign-in that ends with the browser', async () => {
    const { bodies, keep } = signInWith(true);
    expect(keep.checked).toBe(false);
    await waitFor(() => expect(bodies).toEqual([{ email: 'coach@example.test', password: 'a-long-password', staySignedIn: false }]));
  });
});

describe('"Keep me signed in" when joining by an invitation', () => {
  it('is offered there too, ticked, and unticked asks for a sign-in that ends with the browser', async () => {
    const bodies: Record<string, unknown>[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        if (init?.method === 'POST') {
          bodies.push(JSON.parse(String(init.body)));
          return jsonResponse(signedIn({ role: 'assistant' }));
        }
        return jsonResponse({ email: 'kitchen@example.test', role: 'assistant', workspaceName: 'Example Prep' });
      }),
    );
    renderInApp(<Join />);
    const keep = (await screen.findByRole('checkbox', { name: 'Keep me signed in on this device' })) as HTMLInputElement;
    expect(keep.checked).toBe(true);
    fireEvent.change(screen.getByLabelText('Your name'), { target: { value: 'Kit Chen' } });
    fireEvent.change(screen.getByLabelText('Choose a password'), { target: { value: 'a-long-password' } });
    fireEvent.click(keep);
    fireEvent.click(screen.getByRole('button', { name: 'Join' }));
    await waitFor(() => expect(bodies).toEqual([{ name: 'Kit Chen', password: 'a-long-password', staySignedIn: false }]));
  });
});
