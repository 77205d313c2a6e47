/** Every route path of the client. Screens link with getHref, the router uses path. */
export const paths = {
  root: { path: '/', getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string) =>
      redirectTo ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}` : '/sign-in',
  },
  today: { path: '/today', getHref: () => '/today' },
  users: { path: '/users', getHref: () => '/users' },
} as const;
