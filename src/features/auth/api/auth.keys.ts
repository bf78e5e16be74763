export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  invitations: () => [...authKeys.all, 'invitations'] as const,
  members: () => [...authKeys.all, 'members'] as const,
  workspaces: () => [...authKeys.all, 'workspaces'] as const,
  devices: () => [...authKeys.all, 'devices'] as const,
  invitation: (token: string) => [...authKeys.all, 'invitation', token] as const,
};
