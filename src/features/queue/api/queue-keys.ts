/** Query keys of the work queue. */
export type QueueState = 'approved' | 'cut' | 'sewn';

export const queueKeys = {
  all: ['queue'] as const,
  list: (state: QueueState) => [...queueKeys.all, state] as const,
};
