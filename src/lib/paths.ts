// Every route string of the client, in one place. Build links with the helpers, never by hand.
export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string | null) =>
      `/sign-in${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ''}`,
  },
  register: { path: '/register', getHref: () => '/register' },
  farms: { path: '/farms', getHref: () => '/farms' },
  farmMap: { path: '/farms/:farmId', getHref: (farmId: number | string) => `/farms/${farmId}` },
  estimate: { path: '/estimate', getHref: () => '/estimate' },
} as const;
