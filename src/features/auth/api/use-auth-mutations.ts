import { useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  AcceptInvitationInput,
  ChangePasswordInput,
  CreateInvitationInput,
  DevicesSignedOutDto,
  InvitationDto,
  LoginInput,
  MeDto,
  MemberDto,
  PasswordChangedDto,
  RegisterInput,
  UpdatePreferencesInput,
} from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';
import { authKeys } from './auth.keys';

export function useLogin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginInput) => api.post<MeDto>('/auth/login', input),
    meta: { form: true },
    onSuccess: (me) => {
      qc.clear();
      qc.setQueryData(authKeys.me(), me);
    },
  });
}

export function useRegister() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RegisterInput) => api.post<MeDto>('/auth/register', input),
    meta: { form: true },
    onSuccess: (me) => {
      qc.clear();
      qc.setQueryData(authKeys.me(), me);
    },
  });
}

export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => api.post<MeDto>(`/invitations/${token}/accept`, input),
    meta: { form: true },
    onSuccess: (me) => {
      qc.clear();
      qc.setQueryData(authKeys.me(), me);
    },
  });
}

export function useLogout() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/auth/logout'),
    onSuccess: () => {
      qc.clear();
      qc.setQueryData(authKeys.me(), null);
    },
  });
}

export function useUpdatePreferences() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdatePreferencesInput) => api.patch<MeDto>('/auth/me', input),
    onSuccess: (me) => qc.setQueryData(authKeys.me(), me),
  });
}

/** A new password; the server signs out every other device at the same time (the list of devices follows). */
export function useChangePassword() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ChangePasswordInput) => api.post<PasswordChangedDto>('/auth/password', input),
    meta: { form: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.devices() }),
  });
}

/** Signs out one other device signed in as this person (by its handle from the list). */
export function useSignOutDevice() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/auth/devices/${id}`),
    onSettled: () => qc.invalidateQueries({ queryKey: authKeys.devices() }),
  });
}

/** Signs out every device signed in as this person but this one. */
export function useSignOutOtherDevices() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<DevicesSignedOutDto>('/auth/devices/sign-out-others'),
    onSettled: () => qc.invalidateQueries({ queryKey: authKeys.devices() }),
  });
}

export function useCreateInvitation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateInvitationInput) => api.post<InvitationDto>('/invitations', input),
    meta: { form: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.invitations() }),
  });
}

export function useRevokeInvitation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/invitations/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.invitations() }),
  });
}

/** Ends someone's access to the workspace; the list of people (and invitations, which show who joined) read again. */
export function useRemoveMember() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/members/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.members() }),
  });
}

/** Makes a team member a coach or a kitchen assistant (from their next request). */
export function useChangeMemberRole() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: number; role: 'coach' | 'assistant' }) => api.patch<MemberDto>(`/members/${id}`, { role }),
    onSettled: () => qc.invalidateQueries({ queryKey: authKeys.members() }),
  });
}
