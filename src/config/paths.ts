/** Every client URL in one place: `paths.home.href()`. */
export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: {
    path: '/sign-in',
    /** `next` is the page to return to; it must already be a safe same-site path. */
    href: (next?: string) => (next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  },
  signUp: { path: '/sign-up', href: () => '/sign-up' },
  account: { path: '/account', href: () => '/account' },
  studio: { path: '/studio', href: () => '/studio' },
  clients: { path: '/clients', href: () => '/clients' },
  client: { path: '/clients/:clientId', href: (id: number) => `/clients/${id}` },
  fitting: {
    path: '/clients/:clientId/fitting',
    /** `correct` is the measurement set to correct (a new version of it); without it a new set is taken. */
    href: (id: number, correct?: number) => `/clients/${id}/fitting${correct ? `?correct=${correct}` : ''}`,
  },
  fabrics: { path: '/fabrics', href: () => '/fabrics' },
  fabricNew: { path: '/fabrics/new', href: () => '/fabrics/new' },
  fabric: { path: '/fabrics/:fabricId', href: (id: number) => `/fabrics/${id}` },
  drafts: { path: '/drafts', href: () => '/drafts' },
  draftNew: {
    path: '/drafts/new',
    /** `clientId` starts the flow with that client chosen. */
    href: (clientId?: number) => (clientId ? `/drafts/new?client=${clientId}` : '/drafts/new'),
  },
  draft: { path: '/drafts/:draftId', href: (id: number) => `/drafts/${id}` },
  queue: { path: '/queue', href: () => '/queue' },
  forgotPassword: { path: '/forgot-password', href: () => '/forgot-password' },
  resetPassword: { path: '/reset-password/:token', href: (token: string) => `/reset-password/${token}` },
  acceptInvitation: { path: '/invitations/:token', href: (token: string) => `/invitations/${token}` },
  studioInvitations: { path: '/studio/invitations', href: () => '/studio/invitations' },
  studioMail: { path: '/studio/mail', href: () => '/studio/mail' },
  studioMailMessage: { path: '/studio/mail/:messageId', href: (id: number) => `/studio/mail/${id}` },
} as const;
