import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { applyServerErrors } from '@/lib/form-errors';
import { ApiError } from '@/lib/problem';
import { Component as ResetPassword } from '@/app/routes/auth/reset-password.route';
import { jsonResponse, renderInApp } from './render';

afterEach(() => vi.unstubAllGlobals());

const invalid = (errors: Record<string, string[]>) =>
  new ApiError({ type: 'about:blank', title: 'Bad Request', status: 400, code: 'validation', detail: 'Invalid input', errors } as never);

describe('a 400’s field errors on a form', () => {
  it('puts each on its field; one for a field the form does not have comes back for the form as a whole', () => {
    const setError = vi.fn();
    const err = invalid({ newPassword: ['Too short'], token: ['This reset link has expired or was already used; ask for a new one'] });
    expect(applyServerErrors(err, setError, { newPassword: 'x', confirm: 'x' })).toBe('This reset link has expired or was already used; ask for a new one');
    expect(setError.mock.calls).toEqual([['newPassword', { type: 'server', message: 'Too short' }]]);
  });

  it('a nested field counts as the form’s when its first part is (lines of a list), "body." is dropped', () => {
    const setError = vi.fn();
    expect(applyServerErrors(invalid({ 'body.items.2.amount': ['Not an amount'] }), setError, { items: [] })).toBeNull();
    expect(setError.mock.calls).toEqual([['items.2.amount', { type: 'server', message: 'Not an amount' }]]);
  });

  it('without the form’s values every error goes on a field, as before', () => {
    const setError = vi.fn();
    expect(applyServerErrors(invalid({ token: ['Gone'] }), setError)).toBeNull();
    expect(setError).toHaveBeenCalledTimes(1);
  });
});

describe('choosing a new password from a used reset link', () => {
  it('says the link is used up and offers a new one (the server names the token, which the form does not show)', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        jsonResponse(
          {
            status: 400, code: 'validation', title: 'Bad Request', detail: 'This reset link has expired or was already used',
            errors: { token: ['This reset link has expired or was already used; ask for a new one'] },
          },
          400,
        ),
      ),
    );
    renderInApp(<ResetPassword />);
    fireEvent.change(screen.getByLabelText('New password'), { target: { value: 'a-third-kitchen-password' } });
    fireEvent.change(screen.getByLabelText('New password again'), { target: { value: 'a-third-kitchen-password' } });
    fireEvent.click(screen.getByRole('button', { name: 'Set the new password' }));
    expect(await screen.findByText('This reset link has expired or was already used; ask for a new one')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Ask for a new link' })).toBeTruthy();
  });
});
