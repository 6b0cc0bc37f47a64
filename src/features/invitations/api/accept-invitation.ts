import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth';
import type { InvitationAcceptInput } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';

export interface AcceptVariables extends InvitationAcceptInput {
  token: string;
}

export const acceptInvitation = ({ token, ...body }: AcceptVariables) =>
  api<MeResponse>(`/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST', body, quiet401: true });

/** Creates the member and signs them in: nothing cached for anyone before may show. */
export function useAcceptInvitation({ onSuccess }: { onSuccess?: (me: MeResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (me) => {
      queryClient.clear();
      onSuccess?.(me);
    },
  });
}
