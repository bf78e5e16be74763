import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { createRef } from 'react';
import { PasswordField } from '@/components/ui/field';

afterEach(() => cleanup());

// NIST SP 800-63B §5.1.1.2: the verifier SHOULD offer an option to display the secret while it is entered.
describe('a password box that can show what was typed', () => {
  it('starts as dots; Show makes it readable text without capitals or correction, Hide puts the dots back', () => {
    render(<PasswordField label="Password" autoComplete="current-password" />);
    const box = screen.getByLabelText('Password') as HTMLInputElement;
    expect(box.type).toBe('password');
    expect(box.getAttribute('autocomplete')).toBe('current-password');
    fireEvent.change(box, { target: { value: 'Kitchen-Secret-42' } });
    const toggle = screen.getByRole('button', { name: 'Show password' });
    expect(toggle.getAttribute('aria-controls')).toBe(box.id);
    fireEvent.click(toggle);
    expect(box.type).toBe('text');
    expect(box.value).toBe('Kitchen-Secret-42');
    expect(box.getAttribute('autocapitalize')).toBe('none');
    expect(box.getAttribute('autocorrect')).toBe('off');
    expect(box.getAttribute('spellcheck')).toBe('false');
    fireEvent.click(screen.getByRole('button', { name: 'Hide password' }));
    expect(box.type).toBe('password');
  });

  it('the button neither sends the form nor is taken for the box’s label; sending the form hides the password again', () => {
    const sent = vi.fn((e: { preventDefault: () => void }) => e.preventDefault());
    const ref = createRef<HTMLInputElement>();
    render(
      <form onSubmit={sent}>
        <PasswordField ref={ref} label="New password" hint="At least 10 characters." error="Too short" />
        <button type="submit">Save</button>
      </form>,
    );
    const box = screen.getByLabelText('New password') as HTMLInputElement;
    expect(ref.current).toBe(box);
    expect(box.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getAllByLabelText(/password/i)).toEqual([box]);
    fireEvent.click(screen.getByRole('button', { name: 'Show password' }));
    expect(sent).not.toHaveBeenCalled();
    expect(box.type).toBe('text');
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(sent).toHaveBeenCalledTimes(1);
    expect(box.type).toBe('password');
  });
});
