/**
 * Every query key of the client, in one place, layered `[resource, kind, ...]` (STYLE.md):
 * two features that read the same server data share one cache entry, and a write
 * invalidates a whole resource with `queryKeys.<resource>.all`. Never spell a key by hand.
 */
function resource<const R extends string>(name: R) {
  const all = [name] as const;
  return {
    all,
    lists: () => [...all, 'list'] as const,
    list: <P extends object>(params: P) => [...all, 'list', params] as const,
    details: () => [...all, 'detail'] as const,
    // null: a query kept disabled until there is an id.
    detail: (id: number | null) => [...all, 'detail', id] as const,
  };
}

const lots = resource('lots');
const products = resource('products');
const suppliers = resource('suppliers');
const correctiveActions = resource('corrective-actions');
const returns = resource('returns');
const scorecards = resource('scorecards');

export const queryKeys = {
  /** The signed-in account; kept when the other queries are dropped at sign-in and sign-out. */
  auth: { all: ['auth'] as const, me: () => ['auth', 'me'] as const },
  users: resource('users'),
  lots: {
    ...lots,
    timeline: (lotId: number) => [...lots.all, 'timeline', lotId] as const,
    concessions: (lotId: number) => [...lots.all, 'concessions', lotId] as const,
    /** Lots already received under a PO and packing slip (Receiving's warning). */
    receivedBefore: (poNumber: string, packingSlip: string) =>
      [...lots.all, 'received-before', poNumber, packingSlip] as const,
    /** Concessions waiting for a second approval the signed-in user may give (Today). */
    awaitingApproval: () => [...lots.all, 'concessions', 'awaiting-approval'] as const,
    /** Lots at their reject number (Today, QA lead). */
    rejectReached: () => [...lots.all, 'reject-reached'] as const,
  },
  products: {
    ...products,
    samplingPlan: (productId: number, quantity: number) =>
      [...products.all, 'sampling-plan', productId, quantity] as const,
  },
  suppliers: {
    ...suppliers,
    /** The supplier picker's search answers. */
    choices: (q: string) => [...suppliers.all, 'choices', q] as const,
  },
  instruments: resource('instruments'),
  correctiveActions: {
    ...correctiveActions,
    files: (id: number) => [...correctiveActions.all, 'files', id] as const,
  },
  returns: {
    ...returns,
    returnableLots: (supplierId: number) =>
      [...returns.all, 'returnable-lots', supplierId] as const,
    unreturnedLots: () => [...returns.all, 'lots', 'unreturned'] as const,
  },
  /** The signed-in user's e-mail notices (profile page). */
  notices: { mine: () => ['notices', 'mine'] as const },
  messages: resource('messages'),
  /** The audit screen: its pages of events and the values its filters offer. */
  audit: {
    all: ['audit'] as const,
    list: <P extends object>(params: P) => ['audit', 'list', params] as const,
    facets: () => ['audit', 'facets'] as const,
  },
  scorecards: {
    ...scorecards,
    supplier: <P extends object>(supplierId: number, range: P) =>
      [...scorecards.details(), supplierId, range] as const,
  },
  supplierPortal: { request: (token: string) => ['supplier-portal', token] as const },
};
