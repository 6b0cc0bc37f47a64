import type { ReactNode } from 'react';
import { Alert } from './alert';
import { Button } from './button';
import { Dialog } from './dialog';

export interface ConfirmDialogProps {
  open: boolean;
  title: ReactNode;
  /** What will happen, in plain words. */
  description: ReactNode;
  /** The confirming button's words: say the action ("Remove Rowan"), not "OK". */
  confirmLabel: ReactNode;
  /** "danger" for actions that remove or lock someone out. */
  tone?: 'primary' | 'danger';
  pending?: boolean;
  /** The server's answer when the action failed; the dialog stays open to show it. */
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before an action that is hard to undo, and shows why it failed if it did. */
export function ConfirmDialog({
  open,
  title,
  description,
  confirmLabel,
  tone = 'primary',
  pending = false,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={() => {
        if (!pending) onCancel();
      }}
      title={title}
      description={description}
      footer={
        <>
          <Button onClick={onCancel} disabled={pending} autoFocus>
            Cancel
          </Button>
          <Button variant={tone} onClick={onConfirm} pending={pending}>
            {confirmLabel}
          </Button>
        </>
      }
    >
      {error && <Alert tone="error">{error}</Alert>}
    </Dialog>
  );
}
