import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { loginSchema, type LoginInput } from '@shared/schemas/auth.schema';
import { useLogin } from '@/features/auth/api/use-auth-mutations';
import { Button } from '@/components/ui/button';
import { PasswordField, TextField } from '@/components/ui/field';
import { StaySignedInField } from '@/features/auth/components/stay-signed-in-field';
import { Notice } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { paths } from '@/config/paths';
import { AuthLayout } from './auth-layout';

/** Only same-site paths are followed after sign-in. */
export function safeNext(next: string | null, fallback: string = paths.home) {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : fallback;
}

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const login = useLogin();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<LoginInput>({ resolver: zodResolver(loginSchema), defaultValues: { email: '', password: '', staySignedIn: true } });
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    login.mutate(values, {
      onSuccess: (me) => navigate(safeNext(params.get('next'), me.role === 'client' ? paths.myPlates : paths.home)),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, form.getValues())),
    });
  });
  return (
    <AuthLayout title="Sign in" lead="Coaches, kitchen assistants and clients all sign in here.">
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        {formError && <Notice tone="block" title={formError} />}
        <TextField label="E-mail" type="email" autoComplete="email" error={form.formState.errors.email?.message} {...form.register('email')} />
        <PasswordField
          label="Password"
          autoComplete="current-password"
          error={form.formState.errors.password?.message}
          {...form.register('password')}
        />
        <Link className="-mt-2 self-start text-sm font-bold underline" to={paths.forgotPassword}>
          Forgot password?
        </Link>
        <StaySignedInField {...form.register('staySignedIn')} />
        <Button type="submit" busy={login.isPending}>
          Sign in
        </Button>
      </form>
      <p className="mt-4 text-sm text-ink-soft">
        Running a prep business?{' '}
        <Link className="font-bold underline" to={paths.register}>
          Open a workspace
        </Link>
      </p>
    </AuthLayout>
  );
}
