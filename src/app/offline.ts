import type { QueryClient } from '@tanstack/react-query';
import type { MeDto } from '@shared/schemas/auth.schema';
import { authKeys } from '@/features/auth/api/auth.keys';
import { followMe, meQuery } from '@/features/auth/api/auth.queries';
import { forgetKept, keptPerson } from '@/lib/device-copy';
import { isOnline } from '@/lib/online';
import { isApiError } from '@/lib/problem';

/**
 * The signed-in person for the app's loaders. Without a network, the person whose answers are kept on this device
 * (src/lib/device-copy.ts: a client's plan, a shopping list) is taken as signed in: their pages open from what was
 * kept; the server is asked again once the network is back, and a session that ended meanwhile then says so. With
 * nothing kept, the app waits for the network, as the page says.
 */
export async function signedInPerson(qc: QueryClient): Promise<MeDto | null> {
  if (qc.getQueryData(authKeys.me()) === undefined && !isOnline()) restoreKeptPerson(qc);
  try {
    return await qc.ensureQueryData(meQuery());
  } catch (e) {
    // No answer at all (status 0: a network that is there but reaches nothing): the kept person, if any.
    if (isApiError(e, 0) && restoreKeptPerson(qc)) return qc.getQueryData<MeDto | null>(authKeys.me()) ?? null;
    throw e;
  }
}

function restoreKeptPerson(qc: QueryClient): boolean {
  const me = keptPerson();
  if (!me) return false;
  qc.setQueryData(authKeys.me(), me, { updatedAt: 0 });
  return true;
}

/**
 * Forgets what is kept on this device as soon as the signed-in person is not its owner: signed out, the session found
 * ended, or someone else signed in (or the same person in another coach's workspace), or its owner signed in without
 * "Keep me signed in" (a shared computer keeps nothing). Returns the unsubscribe.
 */
export function followKeptPerson(qc: QueryClient): () => void {
  return followMe(qc, (me) => {
    if (me === undefined) return;
    const owner = keptPerson();
    if (!owner) return;
    if (me === null || me.id !== owner.id || me.workspaceId !== owner.workspaceId || me.staysSignedIn === false) forgetKept();
  });
}
