import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationCreateInput, InvitationView } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { invitationKeys } from './invitation-keys';

export const createInvitation = (body: InvitationCreateInput) => api<InvitationView>('/studio/invitations', { method: 'POST', body });

/** Invites an address with a role; the e-mail goes out before the answer comes back. */
export function useCreateInvitation({ onSuccess }: { onSuccess?: (invitation: InvitationView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: invitationKeys.list() }),
    onSuccess: (invitation) => onSuccess?.(invitation),
  });
}
