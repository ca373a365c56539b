// Every route string of the client, in one place. Build links with the helpers, never by hand.
export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string | null) =>
      `/sign-in${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ''}`,
  },
  register: { path: '/register', getHref: () => '/register' },
  confirmAccount: { path: '/confirm-account', getHref: (token: string) => `/confirm-account?token=${encodeURIComponent(token)}` },
  farms: { path: '/farms', getHref: () => '/farms' },
  farmMap: { path: '/farms/:farmId', getHref: (farmId: number | string) => `/farms/${farmId}` },
  estimate: { path: '/estimate', getHref: () => '/estimate' },
  field: {
    path: '/farms/:farmId/fields/:fieldId',
    getHref: (farmId: number | string, fieldId: number | string, query?: { tab?: string; season?: string | null }) => {
      const q = new URLSearchParams();
      if (query?.tab) q.set('tab', query.tab);
      if (query?.season) q.set('season', query.season);
      const qs = q.toString();
      return `/farms/${farmId}/fields/${fieldId}${qs ? `?${qs}` : ''}`;
    },
  },
  board: {
    path: '/farms/:farmId/board',
    getHref: (farmId: number | string, season?: string | null) =>
      `/farms/${farmId}/board${season ? `?season=${encodeURIComponent(season)}` : ''}`,
  },
  clientBoard: { path: '/board', getHref: () => '/board' },
  people: { path: '/farms/:farmId/people', getHref: (farmId: number | string) => `/farms/${farmId}/people` },
  invitation: { path: '/invitations/:token', getHref: (token: string) => `/invitations/${encodeURIComponent(token)}` },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  resetPassword: { path: '/reset-password', getHref: (token: string) => `/reset-password?token=${encodeURIComponent(token)}` },
  account: { path: '/account', getHref: () => '/account' },
  devMailbox: { path: '/dev/mailbox', getHref: () => '/dev/mailbox' },
  budget: {
    path: '/farms/:farmId/budget',
    getHref: (farmId: number | string, season?: string | null) =>
      `/farms/${farmId}/budget${season ? `?season=${encodeURIComponent(season)}` : ''}`,
  },
  plan: {
    path: '/farms/:farmId/plan',
    getHref: (farmId: number | string, season?: string | null) =>
      `/farms/${farmId}/plan${season ? `?season=${encodeURIComponent(season)}` : ''}`,
  },
  /** The landowner's view: the approved plan for their own fields. */
  landownerPlan: {
    path: '/farms/:farmId/approved-plan',
    getHref: (farmId: number | string, season?: string | null) =>
      `/farms/${farmId}/approved-plan${season ? `?season=${encodeURIComponent(season)}` : ''}`,
  },
} as const;
