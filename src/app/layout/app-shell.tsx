import { Suspense, useState } from 'react';
import { NavLink, Outlet, useNavigate } from 'react-router-dom';
import { useMe } from '@/features/auth/hooks/use-me';
import { useLogout } from '@/features/auth/api/use-auth-mutations';
import { PageSkeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { NAV } from '../nav';

export function AppShell() {
  const me = useMe();
  const logout = useLogout();
  const navigate = useNavigate();
  const [open, setOpen] = useState(false);
  const items = NAV.filter((n) => n.roles.includes(me.role));
  const signOut = () => logout.mutate(undefined, { onSuccess: () => navigate(paths.signIn) });
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-paper-card focus:p-2">
        Skip to content
      </a>
      <header className="no-print sticky top-0 z-30 border-b border-line bg-paper/95 backdrop-blur">
        <div className="mx-auto flex max-w-7xl items-center gap-3 px-4 py-2">
          <NavLink to={paths.home} className="flex items-center gap-2 font-display text-2xl text-ink" aria-label="Trayline home">
            <TrayMark />
            Trayline
          </NavLink>
          <span className="hidden truncate text-sm text-ink-faint md:inline">{me.workspaceName}</span>
          <button
            type="button"
            className="ml-auto min-h-11 rounded-lg border border-line-strong px-3 font-bold md:hidden"
            aria-expanded={open}
            aria-controls="main-nav"
            onClick={() => setOpen((o) => !o)}
          >
            Menu
          </button>
          <nav id="main-nav" aria-label="Main" className={`${open ? 'flex' : 'hidden'} absolute left-0 right-0 top-full flex-col gap-1 border-b border-line bg-paper p-3 md:static md:ml-auto md:flex md:flex-row md:items-center md:border-0 md:p-0`}>
            {items.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.to === paths.home}
                onClick={() => setOpen(false)}
                className={({ isActive }) =>
                  `rounded-lg px-3 py-2 font-bold ${isActive ? 'bg-ink text-paper-card' : 'text-ink hover:bg-paper-deep'}`
                }
              >
                {item.label}
              </NavLink>
            ))}
            <button type="button" onClick={signOut} className="rounded-lg px-3 py-2 text-left font-bold text-ink-soft hover:bg-paper-deep">
              Sign out <span className="sr-only">{me.name}</span>
            </button>
          </nav>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-7xl px-4 py-6">
        <Suspense fallback={<PageSkeleton />}>
          <Outlet />
        </Suspense>
      </main>
      <footer className="no-print mx-auto max-w-7xl px-4 pb-8 text-xs text-ink-faint">
        Trayline plans food; it does not replace your local food code or a licensed professional.
      </footer>
    </div>
  );
}

/** Our mark: a sheet pan cut into portions. */
export function TrayMark({ className = 'h-7 w-7' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden>
      <rect x="2" y="7" width="28" height="18" rx="3" fill="#C2451E" />
      <rect x="5" y="10" width="22" height="12" rx="1.5" fill="#F2C14E" />
      <path d="M12.3 10v12M19.7 10v12M5 16h22" stroke="#8F2A14" strokeWidth="1.4" />
    </svg>
  );
}
