/** Every client-side URL, in one place; pages and links build their hrefs from here. */
export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: {
    path: '/sign-in',
    href: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  },
  register: {
    path: '/register',
    href: (joinCode?: string) =>
      joinCode ? `/register?join=${encodeURIComponent(joinCode)}` : '/register',
  },
  confirmAccount: { path: '/confirm-account', href: () => '/confirm-account' },
  forgotPassword: { path: '/forgot-password', href: () => '/forgot-password' },
  resetPassword: { path: '/reset-password', href: () => '/reset-password' },
  calculations: { path: '/calculations', href: () => '/calculations' },
  calculation: { path: '/calculations/:id', href: (id: string) => `/calculations/${id}` },
  reviews: { path: '/reviews', href: () => '/reviews' },
  plans: { path: '/plans', href: () => '/plans' },
  plan: { path: '/plans/:id', href: (id: string) => `/plans/${id}` },
  envelopes: { path: '/envelopes', href: () => '/envelopes' },
  envelope: { path: '/envelopes/:id', href: (id: string) => `/envelopes/${id}` },
  admin: { path: '/admin', href: () => '/admin' },
  classes: { path: '/classes', href: () => '/classes' },
  classroom: { path: '/classes/:id', href: (id: string) => `/classes/${id}` },
  join: { path: '/join/:code', href: (code: string) => `/join/${code}` },
  example: { path: '/examples/:id', href: (id: string) => `/examples/${id}` },
  version: {
    path: '/calculations/:id/versions/:n',
    href: (id: string, n: number) => `/calculations/${id}/versions/${n}`,
  },
  sheet: {
    path: '/calculations/:id/versions/:n/sheet',
    href: (id: string, n: number) => `/calculations/${id}/versions/${n}/sheet`,
  },
  fillCard: {
    path: '/calculations/:id/versions/:n/fill-card',
    href: (id: string, n: number) => `/calculations/${id}/versions/${n}/fill-card`,
  },
  verify: {
    path: '/verify/:fingerprint?',
    href: (fingerprint?: string) => (fingerprint ? `/verify/${fingerprint}` : '/verify'),
  },
} as const;
