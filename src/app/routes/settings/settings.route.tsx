import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { toast } from 'sonner';
import { changePasswordSchema, type ChangePasswordInput } from '@shared/schemas/auth.schema';
import { useMe } from '@/features/auth/hooks/use-me';
import { useChangePassword, useUpdatePreferences } from '@/features/auth/api/use-auth-mutations';
import { Button } from '@/components/ui/button';
import { PasswordField, SelectField } from '@/components/ui/field';
import { Card, Notice, PageHeader } from '@/components/ui/states';
import { applyServerErrors } from '@/lib/form-errors';
import { NetCarbRuleCard } from '@/features/ingredients/components/net-carb-rule-card';
import { DatesTimesCard } from './dates-times-card';
import { SignedInDevices } from '@/features/auth/components/signed-in-devices';

export function Component() {
  const me = useMe();
  const prefs = useUpdatePreferences();
  const change = useChangePassword();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ChangePasswordInput>({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    change.mutate(values, {
      onSuccess: ({ otherDevicesSignedOut: n }) => {
        form.reset();
        toast.success(n === 0 ? 'Password changed' : `Password changed; ${n === 1 ? '1 other device was' : `${n} other devices were`} signed out`);
      },
      onError: (err) => setFormError(applyServerErrors(err, form.setError, form.getValues())),
    });
  });
  return (
    <div className="flex max-w-2xl flex-col gap-6">
      <PageHeader title="Settings" lead={`${me.name} · ${me.email}`} />
      <Card>
        <h2 className="mb-3 text-xl">Units</h2>
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField
            label="Amounts"
            value={me.unitSystem}
            onChange={(e) => prefs.mutate({ unitSystem: e.target.value as 'us' | 'metric' })}
            hint="Kitchen amounts in cups and ounces, or grams and millilitres."
          >
            <option value="us">US kitchen (cups, oz, lb)</option>
            <option value="metric">Metric (g, mL)</option>
          </SelectField>
          <SelectField
            label="Temperatures"
            value={me.tempUnit}
            onChange={(e) => prefs.mutate({ tempUnit: e.target.value as 'F' | 'C' })}
          >
            <option value="F">°F</option>
            <option value="C">°C</option>
          </SelectField>
        </div>
      </Card>
      {me.role === 'coach' && <DatesTimesCard />}
      {me.role === 'coach' && <NetCarbRuleCard />}
      <Card>
        <h2 className="mb-3 text-xl">Password</h2>
        <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
          {formError && <Notice tone="block" title={formError} />}
          <PasswordField
            label="Current password"
            autoComplete="current-password"
            error={form.formState.errors.currentPassword?.message}
            {...form.register('currentPassword')}
          />
          <PasswordField
            label="New password"
            autoComplete="new-password"
            hint="At least 10 characters."
            error={form.formState.errors.newPassword?.message}
            {...form.register('newPassword')}
          />
          <p className="text-sm text-ink-soft">Changing it signs out every other device signed in as you.</p>
          <Button type="submit" busy={change.isPending} className="self-start">
            Change password
          </Button>
        </form>
      </Card>
      <Card>
        <h2 className="mb-1 text-xl">Signed-in devices</h2>
        <p className="mb-3 text-sm text-ink-soft">
          Where you are signed in, in every workspace you belong to. Sign out a phone you lost or a computer you shared.
        </p>
        <SignedInDevices />
      </Card>
    </div>
  );
}
