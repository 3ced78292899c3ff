/** Every URL of the app in one place; routes and links build paths only from here. */
export const paths = {
  signIn: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  signUp: '/sign-up',
  /** After access to the active company ended: pick one of the others. */
  chooseCompany: '/choose-company',
  forgotPassword: '/forgot-password',
  resetPassword: (token: string) => `/reset-password/${encodeURIComponent(token)}`,
  invitation: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  /** The customer's estimate page; the API builds the same path into the e-mail. */
  customerEstimate: (token: string) => `/e/${encodeURIComponent(token)}`,
  today: '/',
  customers: '/customers',
  newCustomer: '/customers/new',
  customer: (id: string) => `/customers/${encodeURIComponent(id)}`,
  jobs: '/jobs',
  /** With a customer, the form starts on that customer (from their page). */
  newJob: (customerId?: string) =>
    customerId ? `/jobs/new?customerId=${encodeURIComponent(customerId)}` : '/jobs/new',
  job: (id: string) => `/jobs/${encodeURIComponent(id)}`,
  newArea: (jobId: string) => `/jobs/${encodeURIComponent(jobId)}/areas/new`,
  area: (id: string) => `/areas/${encodeURIComponent(id)}`,
  editArea: (id: string) => `/areas/${encodeURIComponent(id)}/edit`,
  estimate: (id: string) => `/estimates/${encodeURIComponent(id)}`,
  invoices: '/invoices',
  invoice: (id: string) => `/invoices/${encodeURIComponent(id)}`,
  layout: '/layout',
  stock: '/stock',
  receiveStock: '/stock/receive',
  roll: (id: string) => `/stock/${encodeURIComponent(id)}`,
  reports: '/reports',
  settings: '/settings',
  crews: '/settings/crews',
  /** The crew calendar; `crew` filters it to one crew, `view` is month or week. */
  calendar: '/calendar',
  profile: '/profile',
} as const;

/** Pages a signed-out visitor may open; a 401 there must not bounce back to sign-in. */
export const publicPathPrefixes = [
  '/sign-in',
  '/sign-up',
  '/forgot-password',
  '/reset-password',
  '/invitations',
  '/e/',
];

/** Only same-site relative paths are accepted as a return path after sign-in. */
export function safeReturnPath(next: string | null): string {
  if (!next || !next.startsWith('/') || next.startsWith('//')) return paths.today;
  return next;
}
