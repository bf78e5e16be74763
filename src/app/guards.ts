import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { signedInPerson } from './offline';
import type { Role } from '@shared/schemas/auth.schema';

/**
 * Loader for the signed-in area: no session → sign-in, then back here (the section a link named too: "#…"). Without a
 * network, the person whose answers are kept on this device stands in (./offline.ts).
 */
export function requireSignedIn(qc: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await signedInPerson(qc);
    if (!me) {
      const url = new URL(request.url);
      // The router's request carries no fragment: on the page first opened (a link from an e-mail) the browser's has it.
      const hash = url.hash || (typeof window !== 'undefined' && window.location.pathname === url.pathname ? window.location.hash : '');
      throw redirect(`${paths.signIn}?next=${encodeURIComponent(url.pathname + url.search + hash)}`);
    }
    return null;
  };
}

/** Loader for a page only some roles may open. */
export function requireRole(qc: QueryClient, roles: Role[]) {
  // Run beside the signed-in area's loader (React Router runs them together): the same reading of the person.
  return async () => {
    const me = await signedInPerson(qc);
    if (me && !roles.includes(me.role)) throw new Response('Not found', { status: 404 });
    return null;
  };
}

