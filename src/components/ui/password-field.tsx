import { useState } from 'react';
import { TextField, type TextFieldProps } from './text-field';

export type PasswordFieldProps = Omit<TextFieldProps, 'type' | 'suffix'>;

/**
 * A password input with a Show/Hide button, so a long passphrase typed on a tablet can be
 * checked before it is sent (OWASP ASVS 4.0.3 §2.1.12: the user can choose to view the masked
 * password).
 */
export function PasswordField(props: PasswordFieldProps) {
  const [visible, setVisible] = useState(false);
  return (
    <TextField
      {...props}
      type={visible ? 'text' : 'password'}
      spellCheck={false}
      autoCapitalize="none"
      suffix={
        <button
          type="button"
          aria-pressed={visible}
          onClick={() => setVisible((v) => !v)}
          className="min-h-touch min-w-touch rounded-lg border border-line bg-panel px-3 text-sm font-medium text-ink hover:bg-surface"
        >
          {visible ? 'Hide' : 'Show'}
          <span className="sr-only"> password</span>
        </button>
      }
    />
  );
}
