import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate } from 'react-router-dom';
import { registerSchema, type RegisterInput } from '@shared/schemas/auth.schema';
import { useRegister } from '@/features/auth/api/use-auth-mutations';
import { Button } from '@/components/ui/button';
import { PasswordField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { paths } from '@/config/paths';
import { deviceClockStyle, deviceDateOrder } from '@/lib/dates';
import { deviceTimeZone } from '@shared/domain/time-zone';
import { AuthLayout } from './auth-layout';

export function Component() {
  const navigate = useNavigate();
  const register = useRegister();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<RegisterInput>({
    resolver: zodResolver(registerSchema),
    defaultValues: { name: '', email: '', password: '', businessName: '' },
  });
  const e = form.formState.errors;
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    register.mutate({ ...values, dateOrder: deviceDateOrder(), clock: deviceClockStyle(), timeZone: deviceTimeZone() ?? undefined }, {
      onSuccess: () => navigate(paths.home),
      onError: (err) => setFormError(applyServerErrors(err, form.setError, form.getValues())),
    });
  });
  return (
    <AuthLayout title="Open a workspace" lead="One workspace per coaching business. You can invite your kitchen assistant and clients next.">
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        {formError && <Notice tone="block" title={formError} />}
        <TextField label="Your name" autoComplete="name" error={e.name?.message} {...form.register('name')} />
        <TextField label="Business name" autoComplete="organization" error={e.businessName?.message} {...form.register('businessName')} />
        <TextField label="E-mail" type="email" autoComplete="email" error={e.email?.message} {...form.register('email')} />
        <PasswordField
          label="Password"
          autoComplete="new-password"
          hint="At least 10 characters."
          error={e.password?.message}
          {...form.register('password')}
        />
        <Button type="submit" busy={register.isPending}>
          Open workspace
        </Button>
      </form>
      <p className="mt-4 text-sm text-ink-soft">
        Already have an account?{' '}
        <Link className="font-bold underline" to={paths.signIn}>
          Sign in
        </Link>
      </p>
    </AuthLayout>
  );
}
