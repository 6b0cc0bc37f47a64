import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { SignInSchema, type MeResponse } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/password-field';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useSignIn } from '../api/sign-in';
import { FormMessage } from './form-message';

type SignInValues = z.input<typeof SignInSchema>;

export interface SignInFormProps {
  onSignedIn: (me: MeResponse) => void;
}

/** E-mail and password; the server's answer (wrong details, too many tries) shows above the button. */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const form = useForm<SignInValues, unknown, z.output<typeof SignInSchema>>({
    resolver: zodResolver(SignInSchema),
    defaultValues: { email: '', password: '' },
  });
  const { errors } = form.formState;
  const signIn = useSignIn({ onSuccess: onSignedIn });

  const submit = form.handleSubmit((values) =>
    signIn.mutateAsync(values).catch((error: unknown) => {
      serverErrorsApply(error, form.setError, ['email', 'password']);
    }),
  );

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Sign in">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        error={errors.email?.message}
        {...form.register('email')}
      />
      <PasswordField label="Password" autoComplete="current-password" error={errors.password?.message} {...form.register('password')} />
      <FormMessage title="Not signed in" message={errors.root?.server?.message} />
      <Button type="submit" variant="primary" block pending={form.formState.isSubmitting} pendingLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
