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
  audit: { path: '/audit', getHref: () => '/audit' },
  suppliers: { path: '/suppliers', getHref: () => '/suppliers' },
  products: { path: '/products', getHref: () => '/products' },
  instruments: { path: '/instruments', getHref: () => '/instruments' },
  reference: { path: '/reference', getHref: () => '/reference' },
  receiving: { path: '/receiving', getHref: () => '/receiving' },
  lots: {
    path: '/lots',
    getHref: (status?: string) => (status ? `/lots?status=${encodeURIComponent(status)}` : '/lots'),
  },
  lot: { path: '/lots/:id', getHref: (id: number | string) => `/lots/${id}` },
  lotBench: { path: '/lots/:id/bench', getHref: (id: number | string) => `/lots/${id}/bench` },
  scorecards: { path: '/scorecards', getHref: () => '/scorecards' },
  supplierScorecard: {
    path: '/scorecards/:supplierId',
    getHref: (id: number | string) => `/scorecards/${id}`,
  },
  returns: {
    path: '/returns',
    getHref: (raise?: { lotId: number; supplierId: number }) =>
      raise ? `/returns?raiseLot=${raise.lotId}&raiseSupplier=${raise.supplierId}` : '/returns',
  },
  returnDetail: { path: '/returns/:id', getHref: (id: number | string) => `/returns/${id}` },
  messages: { path: '/messages', getHref: () => '/messages' },
  profile: { path: '/profile', getHref: () => '/profile' },
  supplierPortal: { path: '/supplier/:token', getHref: (token: string) => `/supplier/${token}` },
  correctiveActions: { path: '/corrective-actions', getHref: () => '/corrective-actions' },
  correctiveActionDetail: {
    path: '/corrective-actions/:id',
    getHref: (id: number | string) => `/corrective-actions/${id}`,
  },
} as const;
