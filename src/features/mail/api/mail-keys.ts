/** Query keys of e-mail: the studio's sent mail, one message, and the sends recorded on a client or draft. */
export const mailKeys = {
  all: ['mail'] as const,
  list: () => [...mailKeys.all, 'list'] as const,
  message: (id: number) => [...mailKeys.all, 'message', id] as const,
  deliveries: () => [...mailKeys.all, 'deliveries'] as const,
  clientDeliveries: (clientId: number) => [...mailKeys.deliveries(), 'client', clientId] as const,
  draftDeliveries: (draftId: number) => [...mailKeys.deliveries(), 'draft', draftId] as const,
};
