import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClientDto, ClientImportResultDto, CreateClientInput, UpdateClientInput } from '@shared/schemas/clients.schema';
import type { CreateInvitationInput, InvitationDto, InviteClientsInput, InviteClientsResultDto } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';
import { clientKeys } from './clients.keys';

export function useCreateClient() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateClientInput) => api.post<ClientDto>('/clients', input),
    meta: { form: true },
    onSuccess: (c) => {
      qc.setQueryData(clientKeys.detail(c.id), c);
      return qc.invalidateQueries({ queryKey: clientKeys.lists() });
    },
  });
}

export function useUpdateClient(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateClientInput) => api.patch<ClientDto>(`/clients/${id}`, input),
    meta: { form: true },
    // The saved profile shows at once; the lists and the published-allergen card are read again without holding up the
    // save's own callbacks (the form is clean as soon as the save is in: leaving then is not asked about).
    onSuccess: (c) => {
      qc.setQueryData(clientKeys.detail(id), c);
      void qc.invalidateQueries({ queryKey: clientKeys.lists() });
      void qc.invalidateQueries({ queryKey: clientKeys.publishedAllergens(id) });
    },
  });
}

export function useDeleteClient() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/clients/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: clientKeys.all }),
  });
}

/** Invites the client to their own "my plates" (POST /api/invitations with the profile's id). */
export function useInviteClient(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (email: string) =>
      api.post<InvitationDto>('/invitations', { email, role: 'client', clientId: id } satisfies CreateInvitationInput),
    meta: { form: true },
    // The profile and the list now show the open invitation.
    onSuccess: () => qc.invalidateQueries({ queryKey: clientKeys.all }),
  });
}

/** Client profiles from a CSV file (POST /api/clients/import); a height or weight as a number alone is read in `units`. */
export function useImportClients() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ file, units }: { file: File; units: 'us' | 'metric' }) => {
      const form = new FormData();
      form.append('units', units);
      form.append('file', file);
      return api.post<ClientImportResultDto>('/clients/import', form);
    },
    // Every failure (the row report, 413, 415) is shown beside the upload, not as a toast.
    meta: { silent: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: clientKeys.lists() }),
  });
}

/** Invites these client profiles at once, each at the e-mail on their profile (POST /api/invitations/clients). */
export function useInviteClients() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (clientIds: number[]) => api.post<InviteClientsResultDto>('/invitations/clients', { clientIds } satisfies InviteClientsInput),
    // The profiles and the list now show the open invitations.
    onSuccess: () => qc.invalidateQueries({ queryKey: clientKeys.all }),
  });
}
