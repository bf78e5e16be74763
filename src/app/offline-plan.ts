import type { QueryClient } from '@tanstack/react-query';
import type { MeDto } from '@shared/schemas/auth.schema';
import { authKeys } from '@/features/auth/api/auth.keys';
import { meQuery } from '@/features/auth/api/auth.queries';
import { forgetSavedPlan, savedPlan } from '@/features/weeks/api/saved-plan';
import { isOnline } from '@/lib/online';
import { isApiError } from '@/lib/problem';

/**
 * The signed-in person for the app's loader. Without a network, a client whose plan is saved on this device is taken
 * as signed in from that plan (their "My plates" opens; the server is asked again once the network is back, and a
 * session that ended meanwhile then says so). Anyone else waits for the network, as the page says.
 */
export async function signedInPerson(qc: QueryClient): Promise<MeDto | null> {
  if (qc.getQueryData(authKeys.me()) === undefined && !isOnline()) restoreFromPlan(qc);
  try {
    return await qc.ensureQueryData(meQuery());
  } catch (e) {
    // No answer at all (status 0: a network that is there but reaches nothing): the saved plan's person, if any.
    if (isApiError(e, 0) && restoreFromPlan(qc)) return qc.getQueryData<MeDto | null>(authKeys.me()) ?? null;
    throw e;
  }
}

function restoreFromPlan(qc: QueryClient): boolean {
  const plan = savedPlan();
  if (!plan) return false;
  qc.setQueryData(authKeys.me(), plan.me, { updatedAt: plan.savedAt });
  return true;
}

/**
 * Forgets the saved plan as soon as the device's signed-in person is not its owner: signed out, the session found
 * ended, or someone else signed in (or the same person in another coach's workspace). Returns the unsubscribe.
 */
export function followSavedPlan(qc: QueryClient): () => void {
  const key = JSON.stringify(authKeys.me());
  return qc.getQueryCache().subscribe((event) => {
    if (event.type !== 'updated' && event.type !== 'added') return;
    if (JSON.stringify(event.query.queryKey) !== key) return;
    const me = event.query.state.data as MeDto | null | undefined;
    if (me === undefined) return;
    const plan = savedPlan();
    if (!plan) return;
    if (me === null || me.id !== plan.me.id || me.workspaceId !== plan.me.workspaceId) forgetSavedPlan();
  });
}
