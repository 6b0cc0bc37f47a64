import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { PASSWORD_MAX, PASSWORD_MIN, SignUpSchema, type MeResponse } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/password-field';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';
import { useSignUp } from '../api/sign-up';
import { FormMessage } from './form-message';

type SignUpValues = z.input<typeof SignUpSchema>;

export interface SignUpFormProps {
  onSignedUp: (me: MeResponse) => void;
}

/** Creates a studio and its first owner, then signs them in. */
export function SignUpForm({ onSignedUp }: SignUpFormProps) {
  const form = useForm<SignUpValues, unknown, z.output<typeof SignUpSchema>>({
    resolver: zodResolver(SignUpSchema),
    defaultValues: { studioName: '', name: '', email: '', password: '' },
  });
  const { errors } = form.formState;
  const signUp = useSignUp({ onSuccess: onSignedUp });

  const submit = form.handleSubmit((values) =>
    signUp.mutateAsync(values).catch((error: unknown) => {
      serverErrorsApply(error, form.setError, ['studioName', 'name', 'email', 'password']);
    }),
  );

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Create a studio">
      <TextField
        label="Studio name"
        hint="As your clients know it; you can change it later."
        autoComplete="organization"
        error={errors.studioName?.message}
        {...form.register('studioName')}
      />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        hint="You sign in with this address."
        error={errors.email?.message}
        {...form.register('email')}
      />
      <PasswordField
        label="Password"
        autoComplete="new-password"
        hint={`${PASSWORD_MIN} to ${PASSWORD_MAX} characters. A few unrelated words make a strong one; very common passwords are refused.`}
        error={errors.password?.message}
        {...form.register('password')}
      />
      <FormMessage title="The studio was not created" message={errors.root?.server?.message} />
      <Button type="submit" variant="primary" block pending={form.formState.isSubmitting} pendingLabel="Creating the studio…">
        Create the studio
      </Button>
    </form>
  );
}
