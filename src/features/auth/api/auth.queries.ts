import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { DEFAULT_DATE_ORDER } from '@shared/domain/iso-date';
import { setClockStyle, setDateOrder, setKitchenZone } from '@/lib/dates';
import { setTempScale } from '@/lib/temp-scale';
import { DEFAULT_CLOCK } from '@shared/domain/clock';
import type { InvitationDto, MeDto, MemberDto, MyWorkspaceDto, Role, SignedInDeviceDto } from '@shared/schemas/auth.schema';
import { api, notifyUnauthorized } from '@/lib/api-client';
import { isApiError } from '@/lib/problem';
import { authKeys } from './auth.keys';

/** The signed-in person, or null when signed out (a 401 is an answer here, not an error). */
export const meQuery = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: async (): Promise<MeDto | null> => {
      try {
        return await api.get<MeDto>('/auth/me');
      } catch (e) {
        if (isApiError(e, 401)) {
          // Read again under an open page (window focus): the session ended there (see session-ended.tsx).
          notifyUnauthorized({ fromMe: true });
          return null;
        }
        throw e;
      }
    },
    staleTime: 5 * 60_000,
  });

export const invitationsQuery = () =>
  queryOptions({ queryKey: authKeys.invitations(), queryFn: () => api.get<InvitationDto[]>('/invitations') });

/** The workspaces the signed-in person belongs to (someone may work for two coaches). */
export const myWorkspacesQuery = () =>
  queryOptions({ queryKey: authKeys.workspaces(), queryFn: () => api.get<MyWorkspaceDto[]>('/auth/workspaces'), staleTime: 5 * 60_000 });

/** The devices signed in as this person (Settings), this one first. */
export const devicesQuery = () => queryOptions({ queryKey: authKeys.devices(), queryFn: () => api.get<SignedInDeviceDto[]>('/auth/devices') });

/** Everyone with access to the workspace (coach only): the Team page, the prep-day papers' recipients. */
export const membersQuery = () => queryOptions({ queryKey: authKeys.members(), queryFn: () => api.get<MemberDto[]>('/members') });

export const invitationQuery = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: () => api.get<{ email: string; role: Role; workspaceName: string }>(`/invitations/${token}`),
    retry: false,
  });

/**
 * Keeps the pages' date and time words (src/lib/dates.ts) on the workspace's settings: whenever the signed-in person
 * is read or replaced (sign-in, a workspace switch, the coach changing a setting), the order and the clock follow,
 * and so does the person's own °F / °C (src/lib/temp-scale.ts). Returns the unsubscribe.
 */
export function followDateOrder(qc: QueryClient): () => void {
  return followMe(qc, (me) => {
    setDateOrder(me?.dateOrder ?? DEFAULT_DATE_ORDER);
    setClockStyle(me?.clock ?? DEFAULT_CLOCK);
    setKitchenZone(me?.timeZone ?? null);
    setTempScale(me?.tempUnit ?? 'F');
  });
}

/**
 * Calls `listener` whenever the signed-in person is read or replaced in the cache (undefined: not read yet; null:
 * nobody signed in). Returns the unsubscribe.
 */
export function followMe(qc: QueryClient, listener: (me: MeDto | null | undefined) => void): () => void {
  const key = JSON.stringify(authKeys.me());
  return qc.getQueryCache().subscribe((event) => {
    if (event.type !== 'updated' && event.type !== 'added') return;
    if (JSON.stringify(event.query.queryKey) !== key) return;
    listener(event.query.state.data as MeDto | null | undefined);
  });
}
