/** Every client route in one place: `path` for the router, `getHref()` for links and redirects. */
export const paths = {
  home: {
    path: '/',
    getHref: () => '/',
  },
  auth: {
    signIn: {
      path: '/sign-in',
      /** `redirectTo` is where to go after signing in; only same-site paths are honoured. */
      getHref: (redirectTo?: string | null) =>
        `/sign-in${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ''}`,
    },
    signUp: {
      path: '/sign-up',
      getHref: (redirectTo?: string | null) =>
        `/sign-up${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ''}`,
    },
  },
  app: {
    locker: {
      path: '/locker',
      getHref: () => '/locker',
    },
    catalogue: {
      path: '/catalogue',
      getHref: () => '/catalogue',
    },
    adminCatalogue: {
      path: '/admin/catalogue',
      getHref: () => '/admin/catalogue',
    },
    trips: {
      path: '/trips',
      getHref: () => '/trips',
    },
    newTrip: {
      path: '/trips/new',
      getHref: () => '/trips/new',
    },
    trip: {
      path: '/trips/:tripId',
      getHref: (tripId: string) => `/trips/${encodeURIComponent(tripId)}`,
    },
    editTrip: {
      path: '/trips/:tripId/edit',
      getHref: (tripId: string) => `/trips/${encodeURIComponent(tripId)}/edit`,
    },
    adminAccounts: {
      path: '/admin/accounts',
      getHref: () => '/admin/accounts',
    },
    adminMail: {
      path: '/admin/mail',
      getHref: () => '/admin/mail',
    },
    outbox: {
      path: '/outbox',
      /** `messageId` opens one message beside the list. */
      getHref: (messageId?: string | null) => `/outbox${messageId ? `?message=${encodeURIComponent(messageId)}` : ''}`,
    },
  },
  /** Pages anyone holding the link may open, signed in or not. */
  links: {
    invite: {
      path: '/invites/:token',
      getHref: (token: string) => `/invites/${encodeURIComponent(token)}`,
    },
    sharedTrip: {
      path: '/share/:token',
      getHref: (token: string) => `/share/${encodeURIComponent(token)}`,
    },
  },
} as const;

/**
 * Keeps a post-sign-in redirect on this site: a path starting with one `/`, never `//host` or a full URL.
 * @example safeRedirect('//evil.example') // '/locker'
 */
export const safeRedirect = (redirectTo: string | null | undefined): string =>
  redirectTo && redirectTo.startsWith('/') && !redirectTo.startsWith('//') ? redirectTo : paths.app.locker.getHref();
