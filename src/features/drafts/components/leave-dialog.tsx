import { useState } from 'react';
import type { Blocker } from 'react-router';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';

export interface LeaveDialogProps {
  blocker: Blocker;
  onSave: () => Promise<unknown>;
}

/** Leaving with unsaved changes: save them, leave them, or stay. */
export function LeaveDialog({ blocker, onSave }: LeaveDialogProps) {
  const [saving, setSaving] = useState(false);
  const open = blocker.state === 'blocked';
  return (
    <Dialog
      open={open}
      onClose={() => blocker.reset?.()}
      title="Save your changes before leaving?"
      description="The parameters you changed since the last save are not saved yet."
      footer={
        <>
          <Button onClick={() => blocker.reset?.()} disabled={saving}>
            Stay here
          </Button>
          <Button variant="danger" onClick={() => blocker.proceed?.()} disabled={saving}>
            Leave without saving
          </Button>
          <Button
            variant="primary"
            pending={saving}
            pendingLabel="Saving…"
            onClick={async () => {
              setSaving(true);
              const saved = await onSave();
              setSaving(false);
              if (saved) blocker.proceed?.();
              else blocker.reset?.();
            }}
          >
            Save and leave
          </Button>
        </>
      }
    />
  );
}
