// Every route path of the client. `path` is the router pattern; `getHref` builds a link.

const withParams = (path: string, params: Record<string, string | null | undefined>) => {
  const qs = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value) qs.set(key, value);
  const s = qs.toString();
  return s ? `${path}?${s}` : path;
};

export const paths = {
  home: { path: '/', getHref: () => '/' },

  auth: {
    signIn: {
      path: '/sign-in',
      /** `next` is where to go after signing in (kept through the sign-in redirect). */
      getHref: (next?: string | null) => withParams('/sign-in', { next: next && next !== '/' ? next : null }),
    },
    forgotPassword: {
      path: '/forgot-password',
      getHref: (email?: string) => withParams('/forgot-password', { email }),
    },
    setPassword: {
      path: '/set-password',
      getHref: (token: string) => withParams('/set-password', { token }),
    },
  },

  account: { path: '/account', getHref: () => '/account' },
  search: { path: '/search', getHref: (q?: string) => withParams('/search', { q }) },

  // Office and shared register
  clients: { path: '/clients', getHref: () => '/clients' },
  walls: { path: '/walls', getHref: () => '/walls' },
  tickets: { path: '/tickets', getHref: () => '/tickets' },
  schedule: { path: '/schedule', getHref: () => '/schedule' },
  stock: { path: '/stock', getHref: () => '/stock' },
  reports: { path: '/reports', getHref: () => '/reports' },
  planner: { path: '/planner', getHref: () => '/planner' },

  // Technician
  vanStock: { path: '/van', getHref: () => '/van' },
  scan: { path: '/scan', getHref: () => '/scan' },

  // Client portal
  visits: { path: '/visits', getHref: () => '/visits' },

  /** The target of a cabinet's QR label: opens that cabinet. */
  cabinetLabel: {
    path: '/c/:serial',
    getHref: (serial: string) => `/c/${encodeURIComponent(serial)}`,
  },

  admin: {
    users: {
      path: '/admin/users',
      getHref: (filters: { q?: string; role?: string } = {}) => withParams('/admin/users', filters),
    },
    audit: {
      path: '/admin/audit',
      getHref: (filters: { entity?: string; entityId?: string; actorId?: string } = {}) =>
        withParams('/admin/audit', filters),
    },
    mailbox: { path: '/admin/mailbox', getHref: () => '/admin/mailbox' },
  },
} as const;

/**
 * Where to go after signing in: only a path inside this app (starts with one "/"), so a link
 * cannot send someone to another site (open redirect).
 */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return paths.home.getHref();
  if (next.startsWith(paths.auth.signIn.path)) return paths.home.getHref();
  return next;
}
