import { useEffect, useRef, useState, useSyncExternalStore, type ReactNode } from 'react';
import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { UNKEPT_SESSION_IDLE_HOURS, type MeDto } from '@shared/schemas/auth.schema';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/field';
import { api, notifySessionResumed } from '@/lib/api-client';
import { paths } from '@/config/paths';
import { errorMessage, isApiError, markShown } from '@/lib/problem';
import { authKeys } from '../api/auth.keys';

/*
 * A session that ends under an open page (signed out in another tab or on another device, a password changed, two
 * weeks without use) does not take the page away: what was typed on it stays, under a "Signed out" dialog that signs
 * the same person in again in place. Only a page opened without a session goes to the sign-in page.
 */

/*
 * The person whose session ended under the open page, until they sign in again (null: none). Kept beside the query
 * client rather than in its cache: a sign-in clears the cache, and nothing here is read from the API.
 */
type Ended = { me: MeDto | null; listeners: Set<() => void> };
const endedStores = new WeakMap<QueryClient, Ended>();
function storeOf(qc: QueryClient): Ended {
  let store = endedStores.get(qc);
  if (!store) endedStores.set(qc, (store = { me: null, listeners: new Set() }));
  return store;
}

function setEnded(qc: QueryClient, me: MeDto | null) {
  const store = storeOf(qc);
  store.me = me;
  store.listeners.forEach((fn) => fn());
}

/** The person whose session ended under the open page, until they sign in again (null: none). */
export function useSessionEnded(): MeDto | null {
  const qc = useQueryClient();
  const store = storeOf(qc);
  return useSyncExternalStore(
    (fn) => {
      store.listeners.add(fn);
      return () => store.listeners.delete(fn);
    },
    () => store.me,
  );
}

/**
 * What a 401 means: with someone signed in (the page is theirs), their session ended: the dialog. With nobody, the
 * sign-in page (`toSignIn`), except for the signed-in check itself, whose "nobody" the router's loader follows.
 */
export function followUnauthorized(qc: QueryClient, toSignIn: () => void) {
  return ({ fromMe }: { fromMe: boolean }) => {
    const ended = storeOf(qc).me;
    // Every read the page had in flight is refused too: the dialog is already up for the first.
    if (ended) return;
    const me = qc.getQueryData<MeDto | null>(authKeys.me());
    if (me) setEnded(qc, me);
    else if (!fromMe) toSignIn();
  };
}

/**
 * The app under the "Signed out" dialog: while it shows, the page behind it keeps its state but takes no input
 * (`inert`), and the keyboard is in the dialog. On a device not kept signed in, the page is hidden meanwhile.
 */
export function SessionGate({ children, signInElsewhere }: { children: ReactNode; signInElsewhere: () => void }) {
  const me = useSessionEnded();
  return (
    <>
      {/* On a device not kept signed in (a shared computer) the page is also hidden: the next person at it sees none of it. */}
      <div inert={!!me} className={me?.staysSignedIn === false ? 'invisible' : undefined}>
        {children}
      </div>
      {me && <SessionEndedDialog me={me} signInElsewhere={signInElsewhere} />}
    </>
  );
}

/** Signed in again, but the page's workspace is no longer theirs (removed from it meanwhile). */
class LeftWorkspace extends Error {}

function SessionEndedDialog({ me, signInElsewhere }: { me: MeDto; signInElsewhere: () => void }) {
  const qc = useQueryClient();
  const [password, setPassword] = useState('');
  const [error, setError] = useState<string | null>(null);
  const field = useRef<HTMLInputElement>(null);
  useEffect(() => field.current?.focus(), []);
  const signIn = useMutation({
    meta: { silent: true },
    mutationFn: async () => {
      const again = await api.post<MeDto>('/auth/login', { email: me.email, password, staySignedIn: me.staysSignedIn !== false });
      if (again.workspaceId === me.workspaceId) return again;
      // Signed in to another of their workspaces by default: back to the one the page belongs to, if it still is theirs.
      try {
        return await api.put<MeDto>('/auth/workspace', { workspaceId: me.workspaceId });
      } catch {
        throw new LeftWorkspace();
      }
    },
    onSuccess: (again) => {
      qc.setQueryData(authKeys.me(), again);
      setEnded(qc, null);
      // The page's reads refused meanwhile come back; typing held in forms stays (nothing is cleared). A live
      // preview refused meanwhile sends again (useLivePreview).
      void qc.invalidateQueries();
      notifySessionResumed();
    },
    onError: (e) => {
      markShown(e);
      // Signed in again, but no longer in the page's workspace: a fresh start where they are.
      if (e instanceof LeftWorkspace) return window.location.assign(paths.home);
      setError(isApiError(e, 401) ? 'That password does not match this account.' : isApiError(e, 400) && !password ? 'Enter your password.' : errorMessage(e));
    },
  });
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/40 p-4">
      <div role="dialog" aria-modal="true" aria-labelledby="session-ended-title" className="w-full max-w-md rounded-tray bg-paper-card p-6 shadow-tray">
        <h2 id="session-ended-title" className="text-2xl">
          Signed out
        </h2>
        <p className="mt-2 text-ink-soft">
          Your session ended (signed out in another tab or on another device, a changed password, or two weeks without
          use; {UNKEPT_SESSION_IDLE_HOURS} hours on a device not kept signed in). This page stays as it is, with anything you typed
          {me.staysSignedIn === false ? ', hidden until you sign in again (this device is not kept signed in)' : ''}. Sign in again to
          carry on, then save again where you were saving.
        </p>
        <form
          className="mt-4 flex flex-col gap-4"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            setError(null);
            if (!password) {
              setError('Enter your password.');
              field.current?.focus();
              return;
            }
            signIn.mutate();
          }}
        >
          {/* For password managers: the account being signed in to. */}
          <input type="hidden" name="email" autoComplete="username" value={me.email} />
          <p>
            Signing in as <strong>{me.email}</strong>
          </p>
          <PasswordField
            ref={field}
            label="Password"
            autoComplete="current-password"
            value={password}
            onChange={(e) => setPassword(e.target.value)}
            error={error ?? undefined}
          />
          <div className="flex flex-wrap items-center gap-3">
            <Button type="submit" busy={signIn.isPending}>
              Sign in and carry on
            </Button>
            <Button type="button" variant="ghost" onClick={signInElsewhere}>
              Sign in as someone else
            </Button>
          </div>
        </form>
      </div>
    </div>
  );
}
