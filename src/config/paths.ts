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
  /** Spare stock: on hand per location (a technician's van first on their phone). */
  stock: {
    path: '/stock',
    /** `tab`: on hand (default), the ledger (of a part with `partId`), vendor returns, the restock list, parts or locations. */
    getHref: (filters: { locationId?: string; partId?: string; tab?: 'ledger' | 'returns' | 'restock' | 'parts' | 'locations' } = {}) =>
      withParams('/stock', filters),
  },
  search: { path: '/search', getHref: (q?: string) => withParams('/search', { q }) },

  // Office and shared register
  clients: { path: '/clients', getHref: () => '/clients' },
  /** A client organisation: service plan, notes, contacts, sites. */
  client: { path: '/clients/:id', getHref: (id: string) => `/clients/${encodeURIComponent(id)}` },
  /** With list filters (clientId, q). */
  sites: {
    path: '/sites',
    getHref: (filters: { clientId?: string; q?: string } = {}) => withParams('/sites', filters),
  },
  /** A site: address, time zone, access notes, contacts, walls. */
  site: { path: '/sites/:id', getHref: (id: string) => `/sites/${encodeURIComponent(id)}` },
  /** With list filters (clientId, siteId, cabinetModelId, q). */
  walls: {
    path: '/walls',
    getHref: (filters: { clientId?: string; siteId?: string; cabinetModelId?: string; q?: string } = {}) => withParams('/walls', filters),
  },
  /** A wall's page: `tab` (map, documents, import), and a cell to open on the map (`col`, `row`). */
  wall: {
    path: '/walls/:id',
    getHref: (id: string, options: { tab?: 'map' | 'documents' | 'import'; col?: number; row?: number; view?: 'front' | 'rear' } = {}) =>
      withParams(`/walls/${encodeURIComponent(id)}`, {
        tab: options.tab && options.tab !== 'map' ? options.tab : null,
        col: options.col ? String(options.col) : null,
        row: options.row ? String(options.row) : null,
        view: options.view === 'rear' ? 'rear' : null,
      }),
  },
  /** Every cabinet, with list filters; `?batch=` is the list of a batch recall. */
  cabinets: {
    path: '/cabinets',
    getHref: (filters: { serial?: string; clientId?: string; siteId?: string; status?: string; batch?: string; modelId?: string } = {}) =>
      withParams('/cabinets', filters),
  },
  /** A printable sheet of QR labels, one per cabinet of the wall. */
  wallLabels: { path: '/walls/:id/labels', getHref: (id: string) => `/walls/${encodeURIComponent(id)}/labels` },
  /** Cabinet models and controllers. */
  catalogue: { path: '/catalogue', getHref: (tab?: 'models' | 'controllers') => withParams('/catalogue', { tab }) },
  tickets: {
    path: '/tickets',
    /** With list filters (the API's query parameters: status, open, clock, assigneeId…). */
    getHref: (filters: Record<string, string | null | undefined> = {}) => withParams('/tickets', filters),
  },
  newTicket: { path: '/tickets/new', getHref: () => '/tickets/new' },
  /** A ticket's page; the e-mails link here (`${APP_URL}/tickets/<id>`). */
  ticket: { path: '/tickets/:id', getHref: (id: string) => `/tickets/${encodeURIComponent(id)}` },
  /** `wall`: start from that wall's model, grid and settings. */
  planner: { path: '/planner', getHref: (wall?: string) => withParams('/planner', { wall }) },
  /** A wall's data and power runs (view, edit by hand, print). */
  wallRuns: { path: '/walls/:id/runs', getHref: (id: string) => `/walls/${encodeURIComponent(id)}/runs` },
  /** The runs as a sheet for the crew, outside the app's shell. */
  wallRunsPrint: { path: '/walls/:id/runs/print', getHref: (id: string) => `/walls/${encodeURIComponent(id)}/runs/print` },

  /**
   * The office's week of visits by technician (`week`: any date of it, YYYY-MM-DD; `ticketId`: plan
   * a visit for that ticket; `visit`: open that visit of the week to move, reassign or cancel it).
   */
  dispatch: {
    path: '/dispatch',
    getHref: (options: { week?: string; ticketId?: string; visit?: string } = {}) => withParams('/dispatch', options),
  },
  /** Visits as a list: a client's visits and reports, a technician's coming days. */
  visits: { path: '/visits', getHref: () => '/visits' },
  /** A visit: address, access, contacts, wall, ticket, checklist, repairs; start and close it. */
  visit: { path: '/visits/:id', getHref: (id: string) => `/visits/${encodeURIComponent(id)}` },
  /** Closing a visit: summary, checklist, the client's signature. */
  closeVisit: { path: '/visits/:id/close', getHref: (id: string) => `/visits/${encodeURIComponent(id)}/close` },
  /** Logging a repair from a visit (`visitId`) or a ticket (`ticketId`), on the wall's map. */
  logRepair: {
    path: '/repairs/new',
    getHref: (from: { visitId?: string; ticketId?: string; wallId?: string; col?: number; row?: number }) =>
      withParams('/repairs/new', {
        visitId: from.visitId,
        ticketId: from.ticketId,
        wallId: from.wallId,
        col: from.col ? String(from.col) : null,
        row: from.row ? String(from.row) : null,
      }),
  },
  /** Repairs waiting on this phone to be sent (logged without signal). */
  outbox: { path: '/outbox', getHref: () => '/outbox' },

  /** Type or scan a cabinet's serial (technicians and office). */
  scan: { path: '/scan', getHref: () => '/scan' },

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
      getHref: (filters: { entity?: string; entityId?: string; actorId?: string } = {}) => withParams('/admin/audit', filters),
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
