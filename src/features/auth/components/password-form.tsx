import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { PASSWORD_MAX, PASSWORD_MIN, ProfileUpdateSchema } from '@shared/schemas/auth';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/password-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useUpdateMe } from '../api/update-me';
import { FormMessage } from './form-message';

type PasswordValues = z.input<typeof ProfileUpdateSchema>;

/** Changes the password; the current one is asked for so a left-open tablet cannot be taken over. */
export function PasswordForm() {
  const form = useForm<PasswordValues, unknown, z.output<typeof ProfileUpdateSchema>>({
    resolver: zodResolver(ProfileUpdateSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const { errors, isDirty } = form.formState;
  const update = useUpdateMe({ onSuccess: () => form.reset({ currentPassword: '', newPassword: '' }) });

  const submit = form.handleSubmit((values) =>
    update.mutateAsync({ currentPassword: values.currentPassword, newPassword: values.newPassword }).catch((error: unknown) => {
      serverErrorsApply(error, form.setError, ['currentPassword', 'newPassword']);
    }),
  );

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Change password">
      <PasswordField
        label="Current password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...form.register('currentPassword')}
      />
      <PasswordField
        label="New password"
        autoComplete="new-password"
        hint={`${PASSWORD_MIN} to ${PASSWORD_MAX} characters. A few unrelated words make a strong one; very common passwords are refused.`}
        error={errors.newPassword?.message}
        {...form.register('newPassword')}
      />
      <FormMessage title="The password was not changed" message={errors.root?.server?.message} />
      {update.isSuccess && !isDirty && <Alert tone="success">Password changed. Use the new one next time you sign in.</Alert>}
      <Button type="submit" variant="primary" pending={form.formState.isSubmitting} pendingLabel="Changing…">
        Change password
      </Button>
    </form>
  );
}
