import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMember } from '../api/update-member';
import { memberActionChanges, memberActionText, type MemberAction } from '../lib/member-action';

export interface MemberActionDialogProps {
  /** The change being asked about; null when the dialog is closed. */
  action: MemberAction | null;
  currentUserId: number;
  onClose: () => void;
  /** After the server made the change, with the sentence to announce. */
  onDone: (message: string, action: MemberAction) => void;
}

/** Confirms a change to a member and makes it; a refusal (the last owner) stays in view. */
export function MemberActionDialog({ action, currentUserId, onClose, onDone }: MemberActionDialogProps) {
  const update = useUpdateMember();
  const remove = useRemoveMember();
  const pending = update.isPending || remove.isPending;
  const error = update.error ?? remove.error;

  const close = () => {
    update.reset();
    remove.reset();
    onClose();
  };

  if (!action) return <ConfirmDialog open={false} title="" description="" confirmLabel="" onConfirm={close} onCancel={close} />;
  const text = memberActionText(action, action.member.id === currentUserId);

  const confirm = () => {
    const finish = () => {
      update.reset();
      remove.reset();
      onDone(text.done, action);
    };
    if (action.kind === 'remove') remove.mutate(action.member.id, { onSuccess: finish });
    else update.mutate({ id: action.member.id, changes: memberActionChanges(action) }, { onSuccess: finish });
  };

  return (
    <ConfirmDialog
      open
      title={text.title}
      description={text.description}
      confirmLabel={text.confirmLabel}
      tone={text.tone}
      pending={pending}
      error={error?.message}
      onConfirm={confirm}
      onCancel={close}
    />
  );
}
