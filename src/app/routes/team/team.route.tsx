import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { createInvitationSchema, type CreateInvitationInput } from '@shared/schemas/auth.schema';
import { useCreateInvitation, useRevokeInvitation } from '@/features/auth/api/use-auth-mutations';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Card, EmptyState, Notice, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { ROLE_WORDS } from '@/lib/words';
import { invitationsQuery, membersQuery } from '@/features/auth/api/auth.queries';
import { useMe } from '@/features/auth/hooks/use-me';
import { TeamMembers } from '@/features/auth/components/team-members';

export function Component() {
  const list = useQuery(invitationsQuery());
  const me = useMe();
  const members = useQuery(membersQuery());
  // An accepted invitation whose person no longer has access (removed above): said so, not "Joined".
  const memberEmails = members.data && new Set(members.data.map((m) => m.email.toLowerCase()));
  const stillIn = (email: string) => !memberEmails || memberEmails.has(email.toLowerCase());
  const create = useCreateInvitation();
  const revoke = useRevokeInvitation();
  const [link, setLink] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<CreateInvitationInput>({
    resolver: zodResolver(createInvitationSchema),
    defaultValues: { email: '', role: 'assistant' },
  });
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    create.mutate(values, {
      onSuccess: (inv) => {
        setLink(inv.link ?? null);
        form.reset({ email: '', role: values.role });
      },
      onError: (err) => setFormError(applyServerErrors(err, form.setError, form.getValues())),
    });
  });
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Team & invitations" lead="Invite your kitchen assistant or a second coach. Clients are invited from their profile." />
      <Card>
        <h2 className="mb-3 text-xl">People with access</h2>
        <TeamMembers workspaceName={me.workspaceName} />
      </Card>
      <Card>
        <h2 className="mb-3 text-xl">Invite someone</h2>
        <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-[2fr_1fr_auto] sm:items-end">
          <TextField label="E-mail" type="email" error={form.formState.errors.email?.message} {...form.register('email')} />
          <SelectField label="Role" error={form.formState.errors.role?.message} {...form.register('role')}>
            <option value="assistant">Kitchen assistant</option>
            <option value="coach">Coach (everything, health notes included)</option>
            <option value="client">Client</option>
          </SelectField>
          <Button type="submit" busy={create.isPending}>
            Invite
          </Button>
        </form>
        {formError && <div className="mt-3"><Notice tone="block" title={formError} /></div>}
        {link && (
          <div className="mt-4">
            <Notice tone="info" title="Invitation link (valid 14 days)">
              <p>Send this link to the person you invited. It works once.</p>
              <input readOnly aria-label="Invitation link" value={link} className="mt-2 w-full rounded border border-line-strong bg-paper px-2 py-1 font-mono text-sm" onFocus={(e) => e.currentTarget.select()} />
            </Notice>
          </div>
        )}
      </Card>
      <Card>
        <h2 className="mb-3 text-xl">Invitations</h2>
        <QueryView
          query={list}
          loading={<Skeleton className="h-20 w-full" />}
          isEmpty={(data) => data.length === 0}
          empty={<EmptyState title="No invitations yet">Invite your kitchen assistant above.</EmptyState>}
        >
          {(data) => (
            <table className="w-full text-left">
              <thead>
                <tr className="border-b border-line text-sm text-ink-faint">
                  <th className="py-2">E-mail</th>
                  <th>Role</th>
                  <th>Status</th>
                  <th><span className="sr-only">Actions</span></th>
                </tr>
              </thead>
              <tbody>
                {data.map((inv) => (
                  <tr key={inv.id} className="border-b border-line">
                    <td className="py-2">{inv.email}</td>
                    <td>{ROLE_WORDS[inv.role]}</td>
                    <td>{inv.acceptedAt ? (stillIn(inv.email) ? 'Joined' : 'Joined; access removed since') : new Date(inv.expiresAt) < new Date() ? 'Expired' : 'Waiting'}</td>
                    <td className="text-right">
                      {!inv.acceptedAt && (
                        <Button size="sm" variant="ghost" onClick={() => revoke.mutate(inv.id)}>
                          Withdraw
                        </Button>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </QueryView>
      </Card>
    </div>
  );
}
