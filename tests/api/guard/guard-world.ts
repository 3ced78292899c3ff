// Two companies set up once for the guard suites: company A with a person in every role and one
// row of every kind the routes name by id, and company B's owner (the "other company").
import { randomUUID } from 'node:crypto';
import type { Role } from '@seamwright/shared';
import type { App } from '../../fixtures/app.js';
import type { Client } from '../../fixtures/client.js';
import { areaBody, createArea } from '../../fixtures/areas.js';
import {
  addMember,
  createCustomer,
  createJob,
  createSite,
  signUpCompany,
  signUpTeam,
  uniqueEmail,
} from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';
import { acceptedJob as bookableJob, createCrew } from '../../fixtures/bookings.js';
import { pngImage, uploadFile } from '../../fixtures/images.js';
import { landscapeTurfId } from '../../fixtures/stock.js';
import { acceptedJob, progressLine } from '../invoices/invoice-fixtures.js';

/** The kinds of rows a path parameter can name. A new kind needs a line in `creators`. */
export type RowKind =
  | 'customer'
  | 'site'
  | 'job'
  | 'area'
  | 'estimate'
  | 'roll'
  | 'priceItem'
  | 'member'
  | 'invitation'
  | 'locateTicket'
  /** A job whose estimate is accepted, so it can be invoiced. */
  | 'acceptedJob'
  /** A sent progress invoice of `acceptedJob`. */
  | 'invoice'
  /** A cheque payment on `invoice`. */
  | 'payment'
  /** An area of `job` with a photo under its drawing. */
  | 'underlaidArea'
  /** An accepted job without an estimate, for crew bookings. */
  | 'bookableJob'
  | 'crew'
  /** A booking of `crew` on `bookableJob`, each on a day of its own. */
  | 'booking';

export interface GuardWorld {
  app: App;
  /** Company A's people by role. */
  people: Record<Role, SignedIn>;
  /** Company B's owner. */
  other: SignedIn;
  companyId: string;
  turfProductId: string;
  /** One row of company A of every kind. */
  ids: Record<RowKind, string>;
}

const dataOf = (body: unknown) => (body as { data: { id: string } }).data;

/** Each booking on its own day (far ahead), so fresh ones never meet a crew's day limit. */
let bookingDay = 0;
const nextBookingDay = () =>
  new Date(Date.UTC(2031, 6, 1) + bookingDay++ * 86_400_000).toISOString().slice(0, 10);

/** Makes a new row of `kind` in company A (for DELETE cells, which use up their row). */
export const creators: Record<RowKind, (w: GuardWorld) => Promise<string>> = {
  customer: async (w) => (await createCustomer(w.people.owner.client)).id,
  site: async (w) => (await createSite(w.people.owner.client, w.ids.customer)).id,
  job: async (w) => (await createJob(w.people.owner.client, w.ids.customer, w.ids.site)).id,
  area: async (w) => (await createArea(w.people.owner.client, w.ids.job, areaBody())).id,
  estimate: async (w) =>
    dataOf((await w.people.owner.client.post(`/api/jobs/${w.ids.job}/estimates`, {})).body).id,
  roll: async (w) =>
    dataOf(
      (
        await w.people.owner.client.post('/api/rolls', {
          turfProductId: w.turfProductId,
          dyeLot: 'GUARD-1',
          widthFt: 15,
          lengthFt: 60,
        })
      ).body,
    ).id,
  priceItem: async (w) =>
    dataOf(
      (
        await w.people.owner.client.post('/api/price-book', {
          kind: 'material',
          key: `guard-${randomUUID().slice(0, 8)}`,
          name: 'Guard material',
          unit: 'bag',
          packSize: 50,
          priceMillicents: 100_000,
        })
      ).body,
    ).id,
  member: async (w) => {
    const spare = await addMember(w.app, w.people.owner.client, 'bookkeeper');
    const res = await w.people.owner.client.get('/api/members?pageSize=100');
    const rows = (res.body as { data: { id: string; userId: string }[] }).data;
    return rows.find((m) => m.userId === spare.me.user.id)!.id;
  },
  invitation: async (w) =>
    dataOf(
      (
        await w.people.owner.client.post('/api/invitations', {
          email: uniqueEmail('guard-invite'),
          role: 'office',
        })
      ).body,
    ).id,
  locateTicket: async (w) =>
    dataOf(
      (
        await w.people.owner.client.post(`/api/jobs/${w.ids.job}/locate-tickets`, {
          number: `GUARD-${randomUUID().slice(0, 6)}`,
          calledAt: new Date(Date.now() - 60_000).toISOString(),
        })
      ).body,
    ).id,
  acceptedJob: async (w) =>
    (await acceptedJob(w.people.owner.client, w.people.office.client)).jobId,
  invoice: async (w) => {
    const { client } = w.people.owner;
    const res = await client.post('/api/invoices', {
      jobId: w.ids.acceptedJob,
      kind: 'progress',
      lines: [progressLine],
    });
    const id = dataOf(res.body).id;
    await client.post(`/api/invoices/${id}/send`, {}).expect(200);
    return id;
  },
  payment: async (w) => {
    const res = await w.people.owner.client
      .post(`/api/invoices/${w.ids.invoice}/payments`, {
        amountCents: 10_000,
        method: 'cheque',
        receivedOn: new Date().toISOString().slice(0, 10),
      })
      .expect(201);
    const payments = (res.body as { data: { payments: { id: string }[] } }).data.payments;
    return payments[payments.length - 1]!.id;
  },
  underlaidArea: async (w) => {
    const area = await createArea(w.people.owner.client, w.ids.job, areaBody());
    const url = `/api/areas/${area.id}/underlay`;
    await uploadFile(w.people.owner.client, url, pngImage(40, 20), 'guard.png').expect(201);
    return area.id;
  },
  bookableJob: async (w) => bookableJob(w.people.owner.client, 'Guard booked job'),
  crew: async (w) =>
    createCrew(w.people.owner.client, { name: `Guard crew ${randomUUID().slice(0, 6)}` }),
  booking: async (w) => {
    const day = nextBookingDay();
    const res = await w.people.owner.client
      .post('/api/bookings', {
        crewId: w.ids.crew,
        jobId: w.ids.bookableJob,
        startDate: day,
        endDate: day,
        phase: 'finishing',
      })
      .expect(201);
    return dataOf(res.body).id;
  },
};

/** Builds the world: about 30 requests, one area plan. */
export async function createGuardWorld(app: App): Promise<GuardWorld> {
  const team = await signUpTeam(app);
  const other = await signUpCompany(app, 'Guard Other Company');
  const w: GuardWorld = {
    app,
    people: {
      owner: team.owner,
      office: team.office,
      bookkeeper: team.bookkeeper,
      crew_lead: team.crew,
    },
    other,
    companyId: team.owner.me.company.id,
    turfProductId: await landscapeTurfId(team.owner.client),
    ids: {} as Record<RowKind, string>,
  };
  // In dependency order: a site needs the customer, a job the site, and so on.
  const order: RowKind[] = [
    'customer',
    'site',
    'job',
    'area',
    'estimate',
    'roll',
    'priceItem',
    'member',
    'invitation',
    'locateTicket',
    'acceptedJob',
    'invoice',
    'payment',
    'underlaidArea',
    'bookableJob',
    'crew',
    'booking',
  ];
  for (const kind of order) w.ids[kind] = await creators[kind](w);
  return w;
}

/** Everyone the matrix walks, each with the client to send as. */
export function columnClient(w: GuardWorld, column: Role | 'other-company'): Client {
  return column === 'other-company' ? w.other.client : w.people[column].client;
}
