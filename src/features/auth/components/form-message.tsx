import { Alert } from '@/components/ui/alert';

export interface FormMessageProps {
  /** The server's message for the whole form (react-hook-form's `errors.root.server`). */
  message: string | undefined;
  title?: string;
}

/** The server's answer above the submit button; nothing when there is none. */
export function FormMessage({ message, title }: FormMessageProps) {
  if (!message) return null;
  return (
    <Alert tone="error" title={title}>
      {message}
    </Alert>
  );
}
