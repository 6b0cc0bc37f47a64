import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ProfileUpdateSchema } from '@shared/schemas/auth';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useUpdateMe } from '../api/update-me';
import { useMember } from '../hooks/use-member';
import { FormMessage } from './form-message';

type ProfileValues = z.input<typeof ProfileUpdateSchema>;

/** Changes the member's name as the studio sees it (validated by the route's own schema). */
export function ProfileForm() {
  const me = useMember();
  const form = useForm<ProfileValues, unknown, z.output<typeof ProfileUpdateSchema>>({
    resolver: zodResolver(ProfileUpdateSchema),
    defaultValues: { name: me.user.name },
  });
  const { errors, isDirty } = form.formState;
  const update = useUpdateMe({ onSuccess: (saved) => form.reset({ name: saved.user.name }) });

  const submit = form.handleSubmit((values) =>
    update.mutateAsync({ name: values.name }).catch((error: unknown) => {
      serverErrorsApply(error, form.setError, ['name']);
    }),
  );

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Your name">
      <TextField
        label="Name"
        autoComplete="name"
        hint="Shown to the other members of your studio."
        error={errors.name?.message}
        {...form.register('name')}
      />
      <FormMessage title="The name was not saved" message={errors.root?.server?.message} />
      {update.isSuccess && !isDirty && <Alert tone="success">Name saved.</Alert>}
      <Button type="submit" variant="primary" pending={form.formState.isSubmitting} pendingLabel="Saving…">
        Save name
      </Button>
    </form>
  );
}
