import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { clientCreateSchema, type ClientCreate, type ClientCreateInput } from '@shared/schemas/client';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { controlClasses, Field } from '@/components/ui/field';
import { TextField } from '@/components/ui/text-field';
import { serverErrorsApply } from '@/lib/form-errors';

/** The form's own values: every field is text while it is being typed. */
export interface ClientFormValues {
  name: string;
  email: string;
  phone: string;
  notes: string;
}

export const CLIENT_FORM_EMPTY: ClientFormValues = { name: '', email: '', phone: '', notes: '' };

const FIELDS = ['name', 'email', 'phone', 'notes'] as const;

interface ClientFormProps {
  defaultValues?: ClientFormValues;
  /** Owners only see and change how to reach a client. */
  showContact?: boolean;
  submitLabel: string;
  pendingLabel: string;
  /** Saves the parsed values; a rejection with the server's answer is shown on the form. */
  onSubmit: (values: ClientCreate) => Promise<unknown>;
  onCancel?: () => void;
  /** Values to load into the form from outside (e.g. "use their copy" after a conflict). */
  resetTo?: ClientFormValues | null;
}

/** Name, e-mail, phone and notes of a client, checked with the same schema as the server. */
export function ClientForm({ defaultValues = CLIENT_FORM_EMPTY, showContact = true, submitLabel, pendingLabel, onSubmit, onCancel, resetTo }: ClientFormProps) {
  const form = useForm<ClientCreateInput, unknown, ClientCreate>({
    resolver: zodResolver(clientCreateSchema),
    defaultValues,
  });
  const { errors, isSubmitting } = form.formState;

  useEffect(() => {
    if (resetTo) form.reset(resetTo);
  }, [resetTo, form]);

  const submit = form.handleSubmit((values) =>
    onSubmit(values).catch((error: unknown) => serverErrorsApply(error, form.setError, FIELDS)),
  );

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Client details">
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register('name')} />
      {showContact && (
        <div className="grid gap-5 sm:grid-cols-2">
          <TextField label="E-mail" type="email" optional inputMode="email" autoCapitalize="none" spellCheck={false} error={errors.email?.message} {...form.register('email')} />
          <TextField label="Phone" type="tel" optional inputMode="tel" error={errors.phone?.message} {...form.register('phone')} />
        </div>
      )}
      <Field label="Notes" optional hint="Fit preferences, what was worn at the fitting, anything the cutter should know." error={errors.notes?.message}>
        {(ids) => (
          <textarea
            id={ids.id}
            aria-invalid={ids.invalid || undefined}
            aria-describedby={ids.describedBy}
            rows={4}
            className={`${controlClasses(ids.invalid)} py-2`}
            {...form.register('notes')}
          />
        )}
      </Field>
      {errors.root?.server?.message && <Alert tone="error" title="Not saved">{errors.root.server.message}</Alert>}
      <div className="flex flex-wrap justify-end gap-3">
        {onCancel && (
          <Button onClick={onCancel} disabled={isSubmitting}>
            Cancel
          </Button>
        )}
        <Button type="submit" variant="primary" pending={isSubmitting} pendingLabel={pendingLabel}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
