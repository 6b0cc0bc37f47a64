import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ResetRequestSchema } from '@shared/schemas/mail';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useRequestReset } from '../api/request-reset';

type Values = z.input<typeof ResetRequestSchema>;

/** Asks for a reset link by e-mail, then says what happens next (the same words for any address). */
export function ForgotPasswordForm() {
  const [answer, setAnswer] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof ResetRequestSchema>>({
    resolver: zodResolver(ResetRequestSchema),
    defaultValues: { email: '' },
  });
  const request = useRequestReset({ onSuccess: (a) => setAnswer(a.message) });
  const submit = form.handleSubmit((values) =>
    request.mutateAsync(values).catch((error: unknown) => serverErrorsApply(error, form.setError, ['email'])),
  );

  if (answer) {
    return (
      <Alert tone="success" title="Check your e-mail">
        {answer}
      </Alert>
    );
  }
  const { errors } = form.formState;
  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Reset your password">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        hint="The address you sign in with."
        error={errors.email?.message}
        {...form.register('email')}
      />
      {errors.root?.server?.message && (
        <Alert tone="error" title="Not sent">
          {errors.root.server.message}
        </Alert>
      )}
      <Button type="submit" variant="primary" block pending={form.formState.isSubmitting} pendingLabel="Sending…">
        Send me a reset link
      </Button>
    </form>
  );
}
