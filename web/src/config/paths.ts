/** Every client-side URL, in one place; pages and links build their hrefs from here. */
export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: { path: '/sign-in', href: () => '/sign-in' },
} as const;
