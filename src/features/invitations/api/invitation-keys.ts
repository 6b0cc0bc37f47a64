/** Query keys of invitations: the studio's list (owners) and one link's offer (anyone holding it). */
export const invitationKeys = {
  all: ['invitations'] as const,
  list: () => [...invitationKeys.all, 'list'] as const,
  offer: (token: string) => [...invitationKeys.all, 'offer', token] as const,
};
