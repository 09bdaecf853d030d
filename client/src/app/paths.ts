/** Every route of the app: its pattern for the router and a builder for links. */
export const paths = {
  today: { path: '/', href: () => '/' },
  checks: { path: '/checks', href: () => '/checks' },
  trips: { path: '/trips', href: () => '/trips' },
  defects: { path: '/defects', href: () => '/defects' },
  more: { path: '/more', href: () => '/more' },
  signIn: {
    path: '/sign-in',
    /** `next`: where to go after signing in (an in-app path). */
    href: (next?: string) => (next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  },
  /** A shared device's members: switch with a PIN. `next`: where to go after switching. */
  members: {
    path: '/members',
    href: (next?: string) => (next && next !== '/' ? `/members?next=${encodeURIComponent(next)}` : '/members'),
  },
  memberAdd: { path: '/members/add', href: () => '/members/add' },
  /** Pages opened from e-mailed links; the token follows `#token=`. */
  acceptInvite: { path: '/accept-invite', href: () => '/accept-invite' },
  resetPassword: { path: '/reset-password', href: () => '/reset-password' },
  forgotPassword: { path: '/forgot-password', href: () => '/forgot-password' },
  reviewDesk: { path: '/review', href: () => '/review' },
  boatFile: { path: '/boats/:boatId', href: (boatId: string) => `/boats/${encodeURIComponent(boatId)}` },
  fleet: { path: '/fleet', href: () => '/fleet' },
  /** `new` as the id opens an empty form. */
  boatEdit: { path: '/fleet/boats/:boatId', href: (boatId: string = 'new') => `/fleet/boats/${encodeURIComponent(boatId)}` },
  motorEdit: { path: '/fleet/motors/:motorId', href: (motorId: string = 'new') => `/fleet/motors/${encodeURIComponent(motorId)}` },
  checkStart: {
    path: '/checks/start',
    href: (start: { type?: 'launch' | 'stow'; boatId?: string } = {}) => withQuery('/checks/start', { type: start.type, boat: start.boatId }),
  },
  /** `section`: the 1-based screen of the runner to open; without it the runner opens where the check was left. */
  checkRun: {
    path: '/checks/run/:checkId',
    href: (checkId: string, section?: number) => withQuery(`/checks/run/${encodeURIComponent(checkId)}`, { section }),
  },
  defectNew: { path: '/defects/new', href: (boatId?: string) => withQuery('/defects/new', { boat: boatId }) },
  defectFile: { path: '/defects/:defectId', href: (defectId: string) => `/defects/${encodeURIComponent(defectId)}` },
  admin: { path: '/admin', href: () => '/admin' },
  tripFile: { path: '/trips/:tripId', href: (tripId: string) => `/trips/${encodeURIComponent(tripId)}` },
  incidentNew: { path: '/trips/:tripId/incidents/new', href: (tripId: string) => `/trips/${encodeURIComponent(tripId)}/incidents/new` },
  incidentFile: { path: '/incidents/:incidentId', href: (incidentId: string) => `/incidents/${encodeURIComponent(incidentId)}` },
  templates: { path: '/admin/templates', href: () => '/admin/templates' },
  templateEdit: { path: '/admin/templates/:checkType', href: (checkType: 'launch' | 'stow') => `/admin/templates/${checkType}` },
  /** The Review desk's other screens; its tables are `reviewDesk` with `?tab=` and their filters. */
  deskRecord: {
    path: '/review/records/:kind/:recordId',
    href: (kind: string, recordId: string) => `/review/records/${encodeURIComponent(kind)}/${encodeURIComponent(recordId)}`,
  },
  deskDay: { path: '/review/day', href: (date?: string) => withQuery('/review/day', { date }) },
  deskConflicts: { path: '/review/conflicts', href: () => '/review/conflicts' },
  seasonReport: { path: '/season-report', href: () => '/season-report' },
  crewAwards: { path: '/crew-awards', href: () => '/crew-awards' },
  caughtMail: { path: '/admin/mail', href: () => '/admin/mail' },
} as const;

function withQuery(path: string, query: Record<string, string | number | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined) params.set(key, String(value));
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

type Paths = typeof paths;
/** Routes a menu can link to as they are: those whose link needs no id. */
export type RouteName = { [K in keyof Paths]: [] extends Parameters<Paths[K]['href']> ? K : never }[keyof Paths];

/** Only in-app paths are followed after sign-in, so a link cannot send someone off-site. */
export function safeNextPath(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\') ? next : paths.today.href();
}
