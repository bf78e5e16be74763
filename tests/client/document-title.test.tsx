import { describe, expect, it } from 'vitest';
import { act, render, screen } from '@testing-library/react';
import { PageHeader } from '@/components/ui/states';
import { AuthLayout } from '@/app/routes/auth/auth-layout';
import { renderAtRoute } from './render';

// WCAG 2.2 success criterion 2.4.2 "Page Titled": each page has a title that describes its topic (W3C).
describe('the browser tab’s title', () => {
  it('names the page, then the app, and goes back to the app’s name when the page goes', async () => {
    const { router } = renderAtRoute(<PageHeader title="Week of Dec 7" lead="Prep Sun, Dec 6" />, '/weeks/:id', '/weeks/4');
    expect(document.title).toBe('Week of Dec 7 · Trayline');
    // The next page is still loading (no heading yet): it does not wear the last one's title.
    await act(() => router.navigate('/elsewhere'));
    await screen.findByText('Another page');
    expect(document.title).toBe('Trayline');
  });

  it('follows a heading that changes (a tray renamed), and takes a tab title where the heading greets', () => {
    const { rerender } = render(<PageHeader title="Egg slab" />);
    expect(document.title).toBe('Egg slab · Trayline');
    rerender(<PageHeader title="Spinach egg slab" />);
    expect(document.title).toBe('Spinach egg slab · Trayline');
    rerender(<PageHeader title="Hello, Ada" tabTitle="This week" />);
    expect(document.title).toBe('This week · Trayline');
  });

  it('names the sign-in pages too', () => {
    render(
      <AuthLayout title="Forgot your password?">
        <p>form</p>
      </AuthLayout>,
    );
    expect(document.title).toBe('Forgot your password? · Trayline');
  });
});
