/** Every URL of the desk. Build links with getHref, match routes with path. */
export const paths = {
  auth: {
    signIn: {
      path: '/sign-in',
      getHref: (next?: string | null) =>
        next ? `/sign-in?${new URLSearchParams({ next }).toString()}` : '/sign-in',
    },
    forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
    resetPassword: {
      path: '/reset-password',
      getHref: (token: string) => `/reset-password?${new URLSearchParams({ token }).toString()}`,
    },
    acceptInvite: {
      path: '/accept-invite',
      getHref: (token: string) => `/accept-invite?${new URLSearchParams({ token }).toString()}`,
    },
  },
  app: {
    desk: { path: '/', getHref: () => '/' },
    queue: {
      path: '/claims',
      /** The queue; `search` holds its filters, as the queue writes them into the URL. */
      getHref: (search?: URLSearchParams | string) => {
        const query = search?.toString();
        return query ? `/claims?${query}` : '/claims';
      },
    },
    fileClaim: { path: '/claims/new', getHref: () => '/claims/new' },
    claim: {
      path: '/claims/:claimId',
      getHref: (claimId: string, section?: string) =>
        `/claims/${encodeURIComponent(claimId)}${section ? `#${section}` : ''}`,
    },
    verdict: {
      path: '/claims/:claimId/verdict',
      getHref: (claimId: string) => `/claims/${encodeURIComponent(claimId)}/verdict`,
    },
    signoff: {
      path: '/claims/:claimId/signoff',
      getHref: (claimId: string) => `/claims/${encodeURIComponent(claimId)}/signoff`,
    },
    search: {
      path: '/search',
      /** The search page; `search` holds the words and filters, as the page writes them into the URL. */
      getHref: (search?: URLSearchParams | string) => {
        const query = search?.toString();
        return query ? `/search?${query}` : '/search';
      },
    },
    datasets: { path: '/datasets', getHref: () => '/datasets' },
    newDataset: { path: '/datasets/new', getHref: () => '/datasets/new' },
    dataset: {
      path: '/datasets/:datasetId',
      getHref: (datasetId: string) => `/datasets/${encodeURIComponent(datasetId)}`,
    },
    workbench: {
      path: '/workbench/:calculatorId?',
      /** The workbench, on one calculator and saving to one claim when given. */
      getHref: (calculatorId?: string, claimId?: string) => {
        const path = calculatorId ? `/workbench/${encodeURIComponent(calculatorId)}` : '/workbench';
        return claimId ? `${path}?${new URLSearchParams({ claim: claimId }).toString()}` : path;
      },
    },
    people: { path: '/people', getHref: () => '/people' },
    ratingScale: { path: '/rating-scale', getHref: () => '/rating-scale' },
    outbox: {
      path: '/outbox',
      /** The outbox; `search` holds the state tab and page, as the page writes them into the URL. */
      getHref: (search?: URLSearchParams | string) => {
        const query = search?.toString();
        return query ? `/outbox?${query}` : '/outbox';
      },
    },
    audit: {
      path: '/audit',
      /** The audit trail; `search` holds its filters, as the page writes them into the URL. */
      getHref: (search?: URLSearchParams | string) => {
        const query = search?.toString();
        return query ? `/audit?${query}` : '/audit';
      },
    },
    account: { path: '/account', getHref: () => '/account' },
  },
} as const;

/**
 * Where to go after signing in: only a path inside the desk, never another origin
 * (`//evil.test` or `https://…` would make the sign-in page an open redirect).
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) {
    return paths.app.desk.getHref();
  }
  return next;
}
