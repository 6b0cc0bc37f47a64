import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { MeResponse } from '@shared/schemas/auth';
import { InvitationAcceptSchema } from '@shared/schemas/mail';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/password-field';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';

type Values = z.input<typeof InvitationAcceptSchema>;

export interface AcceptInvitationFormProps {
  token: string;
  email: string;
  onAccepted: (me: MeResponse) => void;
}

/** The new member's name and password; accepting signs them in. */
export function AcceptInvitationForm({ token, email, onAccepted }: AcceptInvitationFormProps) {
  const form = useForm<Values, unknown, z.output<typeof InvitationAcceptSchema>>({
    resolver: zodResolver(InvitationAcceptSchema),
    defaultValues: { name: '', password: '' },
  });
  const accept = useAcceptInvitation({ onSuccess: onAccepted });
  const submit = form.handleSubmit((values) =>
    accept.mutateAsync({ token, ...values }).catch((error: unknown) => serverErrorsApply(error, form.setError, ['name', 'password'])),
  );
  const { errors } = form.formState;
  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Accept the invitation">
      <TextField label="E-mail" type="email" name="username" autoComplete="username" value={email} readOnly hint="You sign in with this address." />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
      <PasswordField
        label="Password"
        autoComplete="new-password"
        hint="At least 8 characters; a few unrelated words make a strong one."
        error={errors.password?.message}
        {...form.register('password')}
      />
      {errors.root?.server?.message && (
        <Alert tone="error" title="Not joined">
          {errors.root.server.message}
        </Alert>
      )}
      <Button type="submit" variant="primary" block pending={form.formState.isSubmitting} pendingLabel="Joining…">
        Join the studio
      </Button>
    </form>
  );
}
