/** Every route path and link builder, declared once. Routes use `.path`; links use `.build()`. */

export type SignInNotice = 'password-set' | 'signed-out' | 'invitation-used';

export const paths = {
  home: { path: '/', build: () => '/' },
  signIn: {
    path: '/sign-in',
    build: (options: { next?: string; notice?: SignInNotice } = {}) => {
      const query = new URLSearchParams();
      if (options.next && options.next !== '/') query.set('next', options.next);
      if (options.notice) query.set('notice', options.notice);
      const search = query.toString();
      return search ? `/sign-in?${search}` : '/sign-in';
    },
  },
  signUp: { path: '/sign-up', build: () => '/sign-up' },
  resetPassword: { path: '/reset-password', build: () => '/reset-password' },
  resetPasswordConfirm: {
    path: '/reset-password/:token',
    build: (token: string) => `/reset-password/${encodeURIComponent(token)}`,
  },
  invitation: {
    path: '/invitations/:token',
    build: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  },
  team: { path: '/team', build: () => '/team' },
  board: { path: '/board', build: () => '/board' },
  newJob: {
    path: '/jobs/new',
    build: (options: { stageId?: string; pianoId?: string } = {}) => withQuery('/jobs/new', options),
  },
  job: { path: '/jobs/:id', build: (id: string) => `/jobs/${encodeURIComponent(id)}` },
  clients: { path: '/clients', build: () => '/clients' },
  newClient: { path: '/clients/new', build: () => '/clients/new' },
  client: { path: '/clients/:id', build: (id: string) => `/clients/${encodeURIComponent(id)}` },
  newPiano: {
    path: '/pianos/new',
    build: (options: { clientId?: string } = {}) => withQuery('/pianos/new', options),
  },
  piano: { path: '/pianos/:id', build: (id: string) => `/pianos/${encodeURIComponent(id)}` },
  newSurvey: { path: '/pianos/:id/surveys/new', build: (pianoId: string) => `/pianos/${encodeURIComponent(pianoId)}/surveys/new` },
  survey: { path: '/surveys/:id', build: (id: string) => `/surveys/${encodeURIComponent(id)}` },
  surveyEstimate: { path: '/surveys/:id/estimate', build: (id: string) => `/surveys/${encodeURIComponent(id)}/estimate` },
  catalogue: { path: '/catalogue', build: () => '/catalogue' },
  newCatalogueOperation: { path: '/catalogue/new', build: () => '/catalogue/new' },
  catalogueOperation: { path: '/catalogue/:id', build: (id: string) => `/catalogue/${encodeURIComponent(id)}` },
  /** The client's private page behind the link e-mailed with an estimate: public, no app navigation. */
  clientPage: { path: '/c/:token', build: (token: string) => `/c/${encodeURIComponent(token)}` },
  stagesSettings: { path: '/settings/stages', build: () => '/settings/stages' },
  wallScreensSettings: { path: '/settings/wall-screens', build: () => '/settings/wall-screens' },
  profile: { path: '/profile', build: () => '/profile' },
  workshopSettings: { path: '/settings/workshop', build: () => '/settings/workshop' },
  parts: {
    path: '/parts',
    build: (options: { q?: string; low?: 'true' } = {}) => withQuery('/parts', options),
  },
  newPart: { path: '/parts/new', build: () => '/parts/new' },
  part: { path: '/parts/:id', build: (id: string) => `/parts/${encodeURIComponent(id)}` },
  margins: {
    path: '/margins',
    build: (options: { from?: string; to?: string; status?: string } = {}) => withQuery('/margins', options),
  },
  timesheets: {
    path: '/timesheets',
    build: (options: { technicianId?: string; weekStart?: string } = {}) => withQuery('/timesheets', options),
  },
  /** The workshop's shared touch screen: its own full-screen layout, signed in by its device cookie. */
  wall: { path: '/wall', build: () => '/wall' },
  wallPair: { path: '/wall/pair', build: () => '/wall/pair' },
  ivoryHelp: { path: '/help/ivory', build: () => '/help/ivory' },
  safetyHelp: { path: '/help/safety', build: (anchor?: string) => (anchor ? `/help/safety#${encodeURIComponent(anchor)}` : '/help/safety') },
} as const;

function withQuery(path: string, params: Record<string, string | undefined>): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value) query.set(key, value);
  const search = query.toString();
  return search ? `${path}?${search}` : path;
}

const PUBLIC_PREFIXES = ['/sign-in', '/sign-up', '/reset-password', '/invitations/', '/c/'];
/** The wall screen runs on its device cookie, never a member session, so it never bounces to sign-in. */
const PUBLIC_EXACT = ['/wall'];

/** Pages anyone may open without a session; a 401 there must not bounce to sign-in again. */
export function isPublicPath(pathname: string): boolean {
  return PUBLIC_EXACT.includes(pathname) || PUBLIC_PREFIXES.some((prefix) => pathname === prefix || pathname.startsWith(prefix));
}

/**
 * The `next` return path after sign-in, accepted only when it stays inside this app
 * (starts with one slash, not `//` or `/\`), so a crafted link cannot send people elsewhere.
 */
export function safeNextPath(value: string | null | undefined): string {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return '/';
  if (isPublicPath(value)) return '/';
  return value;
}
