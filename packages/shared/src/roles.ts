/**
 * Roles and the permission table (role × action). The server enforces it in one middleware;
 * the web client reads the same table only to hide what a role cannot do.
 */
export const roles = ['owner', 'office', 'bookkeeper', 'crew_lead'] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  office: 'Office',
  bookkeeper: 'Bookkeeper',
  crew_lead: 'Crew lead',
};

export const actions = [
  'company.read',
  'company.manage',
  'members.read',
  'members.manage',
  'customers.read',
  'customers.write',
  'customers.billing.read',
  'sites.read',
  'sites.write',
  'jobs.read',
  'jobs.write',
  'areas.read',
  'areas.write',
  'plans.preview',
  'audit.read',
  'pricebook.read',
  'pricebook.write',
  'estimating.manage',
  'inventory.read',
  'inventory.write',
  'locate.read',
  'locate.write',
  'estimates.read',
  'estimates.write',
  'estimates.send',
  'invoices.read',
  'invoices.write',
  'payments.write',
  'payments.refund',
  'reminders.manage',
  'crews.read',
  'crews.manage',
  'bookings.read',
  'bookings.write',
  'receivables.read',
  'statements.send',
  'exports.read',
  'dashboard.read',
] as const;
export type Action = (typeof actions)[number];

const everyone: readonly Role[] = roles;

/** Who may do what. Crew leads never see customers' billing details or money. */
export const permissionTable: Record<Action, readonly Role[]> = {
  'company.read': everyone,
  'company.manage': ['owner'],
  'members.read': ['owner'],
  'members.manage': ['owner'],
  'customers.read': ['owner', 'office', 'bookkeeper'],
  'customers.write': ['owner', 'office'],
  'customers.billing.read': ['owner', 'office', 'bookkeeper'],
  'sites.read': ['owner', 'office', 'bookkeeper'],
  'sites.write': ['owner', 'office'],
  // Crew leads will reach their jobs through bookings (calendar work); until then, none.
  'jobs.read': ['owner', 'office', 'bookkeeper'],
  'jobs.write': ['owner', 'office'],
  // A job's areas, saved plans and takeoff follow the job's own access.
  'areas.read': ['owner', 'office', 'bookkeeper'],
  'areas.write': ['owner', 'office'],
  'plans.preview': everyone,
  'audit.read': ['owner'],
  // Prices, markup and tax are money: crew leads never see them; bookkeepers read only.
  'pricebook.read': ['owner', 'office', 'bookkeeper'],
  'pricebook.write': ['owner', 'office'],
  'estimating.manage': ['owner', 'office'],
  // Roll stock carries no money; crew leads look up rolls and lots in the yard.
  'inventory.read': everyone,
  'inventory.write': ['owner', 'office'],
  // Locate (811) tickets carry no money; crew leads must see the ticket and its dig window on
  // site, the office calls them in.
  'locate.read': ['owner', 'office', 'crew_lead'],
  'locate.write': ['owner', 'office'],
  // Estimates are money too: bookkeepers read them, crew leads never see them.
  'estimates.read': ['owner', 'office', 'bookkeeper'],
  'estimates.write': ['owner', 'office'],
  // Sending to the customer, revoking links and recording a paper signature commit the company.
  'estimates.send': ['owner', 'office'],
  // Invoices: the bookkeeper and the owner bill and record money; the office reads an invoice's
  // status (to answer the customer's call); crew leads never see them.
  'invoices.read': ['owner', 'bookkeeper', 'office'],
  'invoices.write': ['owner', 'bookkeeper'],
  'payments.write': ['owner', 'bookkeeper'],
  // Money going back out: the owner alone.
  'payments.refund': ['owner'],
  // Payment reminders speak to customers about money: the schedule, the wording and a reminder
  // sent by hand are the bookkeeper's and the owner's (the log follows invoices.read).
  'reminders.manage': ['owner', 'bookkeeper'],
  // Crews carry no money: everyone sees who is on which crew.
  'crews.read': everyone,
  'crews.manage': ['owner', 'office'],
  // Crew leads read only their own crews' bookings (the service filters), never money.
  'bookings.read': ['owner', 'office', 'crew_lead'],
  'bookings.write': ['owner', 'office'],
  // Receivables (aging, customer statements) and the accountant's CSV exports: the bookkeeper
  // and the owner. The office reads an invoice's status only (invoices.read), never these.
  'receivables.read': ['owner', 'bookkeeper'],
  'statements.send': ['owner', 'bookkeeper'],
  'exports.read': ['owner', 'bookkeeper'],
  // The owner's numbers (pipeline, win rate, margins, crew use): the owner alone.
  'dashboard.read': ['owner'],
};

/** Whether `role` may perform `action`. */
export function can(role: Role, action: Action): boolean {
  return permissionTable[action].includes(role);
}
