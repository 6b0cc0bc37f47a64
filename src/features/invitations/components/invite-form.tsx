import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { InvitationCreateSchema, type InvitationView } from '@shared/schemas/mail';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';

type Values = z.input<typeof InvitationCreateSchema>;

const ROLE_OPTIONS = [
  { value: 'cutter', label: 'Cutter: cuts and finishes approved drafts' },
  { value: 'owner', label: 'Owner: runs the studio with you' },
] as const;

export interface InviteFormProps {
  onInvited: (invitation: InvitationView) => void;
}

/** An address and a role; the invitation is e-mailed at once. */
export function InviteForm({ onInvited }: InviteFormProps) {
  const form = useForm<Values, unknown, z.output<typeof InvitationCreateSchema>>({
    resolver: zodResolver(InvitationCreateSchema),
    defaultValues: { email: '', role: 'cutter' },
  });
  const create = useCreateInvitation({
    onSuccess: (invitation) => {
      form.reset({ email: '', role: invitation.role });
      onInvited(invitation);
    },
  });
  const submit = form.handleSubmit((values) =>
    create.mutateAsync(values).catch((error: unknown) => serverErrorsApply(error, form.setError, ['email', 'role'])),
  );
  const { errors } = form.formState;
  return (
    <form noValidate onSubmit={submit} aria-label="Invite a member" className="space-y-4">
      <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto] md:items-start">
        <TextField
          label="E-mail"
          type="email"
          inputMode="email"
          autoCapitalize="none"
          spellCheck={false}
          autoComplete="off"
          error={errors.email?.message}
          {...form.register('email')}
        />
        <SelectField label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...form.register('role')} />
        <Button type="submit" variant="primary" className="md:mt-7" pending={form.formState.isSubmitting} pendingLabel="Sending…">
          Send the invitation
        </Button>
      </div>
      {errors.root?.server?.message && !errors.email && (
        <Alert tone="error" title="Not invited">
          {errors.root.server.message}
        </Alert>
      )}
    </form>
  );
}
