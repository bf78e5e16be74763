import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useParams } from 'react-router-dom';
import { z } from 'zod';
import { useConfirmPasswordReset } from '@/features/auth/api/use-password-reset';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { paths } from '@/config/paths';
import { AuthLayout } from './auth-layout';

// The shared schema's password rule, plus a UI-only confirmation field.
const formSchema = z
  .object({
    newPassword: z.string().min(10, { message: 'Use at least 10 characters' }).max(200, { message: 'Use at most 200 characters' }),
    confirm: z.string(),
  })
  .refine((v) => v.newPassword === v.confirm, { path: ['confirm'], message: 'The two passwords differ' });
type FormValues = z.infer<typeof formSchema>;

export function Component() {
  const { token = '' } = useParams();
  const confirm = useConfirmPasswordReset();
  const [done, setDone] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { newPassword: '', confirm: '' } });
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    confirm.mutate(
      { token, newPassword: values.newPassword },
      {
        onSuccess: () => setDone(true),
        onError: (err) => setFormError(applyServerErrors(err, form.setError, form.getValues())),
      },
    );
  });
  return (
    <AuthLayout title="Choose a new password">
      {done ? (
        <Notice tone="info" title="Your password is changed">
          Sign in with it now. Every device that was signed in has been signed out.
        </Notice>
      ) : (
        <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
          {formError && (
            <Notice tone="block" title={formError}>
              <Link className="font-bold underline" to={paths.forgotPassword}>Ask for a new link</Link>
            </Notice>
          )}
          <PasswordField label="New password" autoComplete="new-password" hint="At least 10 characters." error={form.formState.errors.newPassword?.message} {...form.register('newPassword')} />
          <PasswordField label="New password again" autoComplete="new-password" error={form.formState.errors.confirm?.message} {...form.register('confirm')} />
          <Button type="submit" busy={confirm.isPending}>Set the new password</Button>
        </form>
      )}
      <p className="mt-4 text-sm">
        <Link className="font-bold underline" to={paths.signIn}>Go to sign-in</Link>
      </p>
    </AuthLayout>
  );
}
