import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ResetConfirmSchema } from '@shared/schemas/mail';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/password-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useConfirmReset } from '../api/confirm-reset';

type Values = z.input<typeof ResetConfirmSchema>;

export interface ResetPasswordFormProps {
  token: string;
  /** The account's address, shown so the member knows which password they are changing. */
  email: string;
  onDone: () => void;
}

/** The new password, checked with the same rules as sign-up. */
export function ResetPasswordForm({ token, email, onDone }: ResetPasswordFormProps) {
  const form = useForm<Values, unknown, z.output<typeof ResetConfirmSchema>>({
    resolver: zodResolver(ResetConfirmSchema),
    defaultValues: { password: '' },
  });
  const confirm = useConfirmReset({ onSuccess: onDone });
  const submit = form.handleSubmit((values) =>
    confirm.mutateAsync({ token, ...values }).catch((error: unknown) => serverErrorsApply(error, form.setError, ['password'])),
  );
  const { errors } = form.formState;
  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Choose a new password">
      {/* Lets password managers store the new password against the right account. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <p className="text-sm text-muted">
        For <span className="font-medium text-ink">{email}</span>
      </p>
      <PasswordField
        label="New password"
        autoComplete="new-password"
        hint="At least 8 characters; a few unrelated words make a strong one."
        error={errors.password?.message}
        {...form.register('password')}
      />
      {errors.root?.server?.message && (
        <Alert tone="error" title="Password not changed">
          {errors.root.server.message}
        </Alert>
      )}
      <Button type="submit" variant="primary" block pending={form.formState.isSubmitting} pendingLabel="Saving…">
        Save the new password
      </Button>
    </form>
  );
}
