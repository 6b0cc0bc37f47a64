import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MemberResponse, MemberUpdateInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { studioKeys } from './studio-keys';

export interface MemberUpdateVariables {
  id: number;
  changes: MemberUpdateInput;
}

export const updateMember = ({ id, changes }: MemberUpdateVariables) =>
  api<MemberResponse>(`/studio/members/${id}`, { method: 'PATCH', body: changes });

/** Role change, disable or enable; the list reloads after. */
export function useUpdateMember({ onSuccess }: { onSuccess?: (member: MemberResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMember,
    onSuccess: async (member) => {
      await queryClient.invalidateQueries({ queryKey: studioKeys.members() });
      onSuccess?.(member);
    },
  });
}
