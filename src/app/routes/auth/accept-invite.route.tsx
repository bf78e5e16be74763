import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { acceptInvitationSchema, type AcceptInvitationInput } from '@shared/schemas/auth.schema';
import { invitationQuery } from '@/features/auth/api/auth.queries';
import { useAcceptInvitation } from '@/features/auth/api/use-auth-mutations';
import { Button } from '@/components/ui/button';
import { PasswordField, TextField } from '@/components/ui/field';
import { StaySignedInField } from '@/features/auth/components/stay-signed-in-field';
import { ErrorState, Notice, Skeleton } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { paths } from '@/config/paths';
import { AuthLayout } from './auth-layout';

const ROLE_WORDS = { coach: 'coach', assistant: 'kitchen assistant', client: 'client' } as const;

export function Component() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invitation = useQuery(invitationQuery(token));
  const accept = useAcceptInvitation(token);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<AcceptInvitationInput>({ resolver: zodResolver(acceptInvitationSchema), defaultValues: { name: '', password: '', staySignedIn: true } });
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    accept.mutate(values, {
      onSuccess: (me) => navigate(me.role === 'client' ? paths.myPlates : paths.home),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, form.getValues())),
    });
  });
  if (invitation.isPending) return <AuthLayout title="Join a workspace"><Skeleton className="h-40 w-full" /></AuthLayout>;
  if (invitation.isError)
    return (
      <AuthLayout title="This invitation cannot be used">
        <ErrorState error={invitation.error} />
        <Link className="mt-4 inline-block font-bold underline" to={paths.signIn}>Go to sign-in</Link>
      </AuthLayout>
    );
  const inv = invitation.data;
  return (
    <AuthLayout title={`Join ${inv.workspaceName}`} lead={`You are invited as ${ROLE_WORDS[inv.role]} with ${inv.email}.`}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        {formError && <Notice tone="block" title={formError} />}
        <TextField label="Your name" autoComplete="name" error={form.formState.errors.name?.message} {...form.register('name')} />
        <PasswordField
          label="Choose a password"
          autoComplete="new-password"
          hint="At least 10 characters. If this e-mail already has a Trayline account, enter its password."
          error={form.formState.errors.password?.message}
          {...form.register('password')}
        />
        <StaySignedInField {...form.register('staySignedIn')} />
        <Button type="submit" busy={accept.isPending}>Join</Button>
      </form>
    </AuthLayout>
  );
}
