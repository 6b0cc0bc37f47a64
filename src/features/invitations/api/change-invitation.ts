import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationView } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { invitationKeys } from './invitation-keys';

export type InvitationChange = 'resend' | 'revoke';

export interface InvitationChangeVariables {
  id: number;
  change: InvitationChange;
}

export const changeInvitation = ({ id, change }: InvitationChangeVariables) =>
  api<InvitationView>(`/studio/invitations/${id}/${change}`, { method: 'POST', body: {} });

/** Resends (a new link, 72 hours more) or revokes an invitation; the list reloads either way. */
export function useChangeInvitation({ onSuccess }: { onSuccess?: (invitation: InvitationView, change: InvitationChange) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeInvitation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: invitationKeys.list() }),
    onSuccess: (invitation, { change }) => onSuccess?.(invitation, change),
  });
}
