import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { requestPasswordResetSchema } from '@shared/schemas/auth.schema';
import { useRequestPasswordReset } from '@/features/auth/api/use-password-reset';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { paths } from '@/config/paths';
import { AuthLayout } from './auth-layout';

export function Component() {
  const request = useRequestPasswordReset();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<{ email: string }>({ resolver: zodResolver(requestPasswordResetSchema), defaultValues: { email: '' } });
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    request.mutate(values, {
      onSuccess: () => setSentTo(values.email),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, form.getValues())),
    });
  });
  return (
    <AuthLayout title="Forgot your password?" lead="Enter your e-mail. If it has a Trayline account, we send a link to choose a new password.">
      {sentTo ? (
        <Notice tone="info" title="Check your e-mail">
          If {sentTo} has an account, a link is on its way. It works once, for 60 minutes.
        </Notice>
      ) : (
        <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
          {formError && <Notice tone="block" title={formError} />}
          <TextField label="E-mail" type="email" autoComplete="email" error={form.formState.errors.email?.message} {...form.register('email')} />
          <Button type="submit" busy={request.isPending}>Send the link</Button>
        </form>
      )}
      <p className="mt-4 text-sm">
        <Link className="font-bold underline" to={paths.signIn}>Back to sign-in</Link>
      </p>
    </AuthLayout>
  );
}
