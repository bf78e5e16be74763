import { Suspense, useState } from 'react';
import { WorkspaceSwitch } from '@/features/auth/components/workspace-switch';
import { Link, NavLink, Outlet, useLocation, useNavigate } from 'react-router-dom';
import { useSignedInOrLeaving } from '@/features/auth/hooks/use-me';
import type { MeDto } from '@shared/schemas/auth.schema';
import { useLogout } from '@/features/auth/api/use-auth-mutations';
import { OfflineLine, PageSkeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { NAV, NAV_GROUPS, navItemActive, type NavItem } from '../nav';
import { ROLE_WORDS } from '@/lib/words';


/**
 * The signed-in frame: a grouped side rail on wide screens, a top bar with a drawer on phones.
 * The navigation lists only what the person's role may open.
 */
export function AppShell() {
  const me = useSignedInOrLeaving();
  // Signed out (the sign-in page's code may still be on its way): nothing of the signed-in area, not an error.
  if (!me) return <Leaving />;
  return <SignedInFrame me={me} />;
}

function Leaving() {
  return (
    <div className="mx-auto max-w-7xl px-4 py-6 md:px-8">
      <PageSkeleton />
    </div>
  );
}

function SignedInFrame({ me }: { me: MeDto }) {
  const logout = useLogout();
  const navigate = useNavigate();
  const location = useLocation();
  const [open, setOpen] = useState(false);
  // The drawer closes when the page changes (state adjusted while rendering, as React documents).
  const [shownPath, setShownPath] = useState(location.pathname);
  if (shownPath !== location.pathname) {
    setShownPath(location.pathname);
    setOpen(false);
  }
  const items = NAV.filter((n) => n.roles.includes(me.role));
  const signOut = () => logout.mutate(undefined, { onSuccess: () => navigate(paths.signIn) });
  const nav = <NavGroups items={items} />;
  return (
    <div className="min-h-screen md:grid md:grid-cols-[15rem_minmax(0,1fr)] print:block">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-paper-card focus:p-2">
        Skip to content
      </a>
      {/* Phone top bar */}
      <header className="no-print sticky top-0 z-30 flex items-center gap-2 border-b border-line bg-paper/95 px-4 py-2 backdrop-blur md:hidden">
        <Brand />
        <button
          type="button"
          className="ml-auto min-h-11 rounded-lg border border-line-strong px-4 font-bold"
          aria-expanded={open}
          aria-controls="phone-nav"
          onClick={() => setOpen((o) => !o)}
        >
          Menu
        </button>
      </header>
      {open && (
        <div id="phone-nav" className="no-print fixed inset-x-0 top-[57px] bottom-0 z-30 overflow-y-auto bg-paper p-4 md:hidden">
          <div className="mb-3">
            <WorkspaceSwitch current={me.workspaceName} />
          </div>
          <nav aria-label="Main">{nav}</nav>
          <SignOut name={me.name} role={ROLE_WORDS[me.role]} onSignOut={signOut} />
        </div>
      )}
      {/* Wide side rail */}
      <aside className="no-print sticky top-0 hidden h-screen flex-col gap-4 overflow-y-auto border-r border-line bg-paper-deep/60 px-3 py-4 md:flex">
        <Brand />
        <WorkspaceSwitch current={me.workspaceName} />
        <nav aria-label="Main" className="flex-1">
          {nav}
        </nav>
        <SignOut name={me.name} role={ROLE_WORDS[me.role]} onSignOut={signOut} />
      </aside>
      <div className="min-w-0">
        <main id="main" className="mx-auto max-w-7xl px-4 py-6 md:px-8">
          <OfflineLine className="mb-4">What this page already shows stays; anything else loads, and saving goes through, once you are back online (keep the page open).</OfflineLine>
          <Suspense fallback={<PageSkeleton />}>
            <Outlet />
          </Suspense>
        </main>
        <footer className="no-print mx-auto max-w-7xl px-4 pb-8 text-xs text-ink-faint md:px-8">
          Trayline plans food; it does not replace your local food code or a licensed professional.
        </footer>
      </div>
    </div>
  );
}

function NavGroups({ items }: { items: NavItem[] }) {
  const { pathname } = useLocation();
  return (
    <div className="flex flex-col gap-4">
      {NAV_GROUPS.map((g) => {
        const inGroup = items.filter((i) => (i.group ?? 'account') === g.id);
        if (inGroup.length === 0) return null;
        return (
          <div key={g.id}>
            <p className="mb-1 px-2 text-xs font-bold uppercase tracking-wider text-ink-faint">{g.label}</p>
            <ul className="flex flex-col gap-0.5">
              {inGroup.map((item) => {
                // The page's item: a week's bake run, shopping list and labels belong to theirs, not to Week board.
                const active = navItemActive(item, pathname);
                return (
                  <li key={item.to}>
                    <Link
                      to={item.to}
                      aria-current={active ? 'page' : undefined}
                      className={`flex min-h-11 items-center rounded-lg px-3 font-bold md:min-h-9 ${
                        active ? 'bg-ink text-paper-card' : 'text-ink hover:bg-paper-deep'
                      }`}
                    >
                      {item.label}
                    </Link>
                  </li>
                );
              })}
            </ul>
          </div>
        );
      })}
    </div>
  );
}

function SignOut({ name, role, onSignOut }: { name: string; role: string; onSignOut: () => void }) {
  return (
    <div className="mt-4 border-t border-line pt-3">
      <p className="px-2 text-sm font-bold">{name}</p>
      <p className="px-2 text-xs text-ink-faint">{role}</p>
      <button type="button" onClick={onSignOut} className="mt-1 min-h-11 w-full rounded-lg px-2 text-left font-bold text-ink-soft hover:bg-paper-deep md:min-h-9">
        Sign out
      </button>
    </div>
  );
}

function Brand() {
  return (
    <NavLink to={paths.home} className="flex items-center gap-2 px-2 font-display text-2xl text-ink" aria-label="Trayline home">
      <TrayMark />
      Trayline
    </NavLink>
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
