// The ordered list of migrations. Listed explicitly (no glob) so they load the same way under
// tsx, vitest and any bundler; add new files at the end, keeping the numbers in order.
import { initialSchema } from './0001-initial-schema.js';
import { rateLimitHits } from './0002-rate-limit-hits.js';
import { tenantCompositeKeys } from './0004-tenant-composite-keys.js';
import { customerList } from './0006-customer-list.js';
import { jobs } from './0007-jobs.js';
import { priceBook } from './0008-price-book.js';
import { jobAreas } from './0009-job-areas.js';
import { estimates } from './0010-estimates.js';
import { estimateLinks } from './0011-estimate-links.js';
import { locateTickets } from './0012-locate-tickets.js';
import { rollStock } from './0013-roll-stock.js';
import { invoices } from './0014-invoices.js';
import { processorEvents } from './0015-processor-events.js';
import { crewsBookings } from './0016-crews-bookings.js';
import { uploads } from './0017-uploads.js';
import { customerSearchWordsMigration } from './0018-customer-search-words.js';
import { reminders } from './0019-reminders.js';
import { reportIndexes } from './0020-report-indexes.js';
import { refunds } from './0021-refunds.js';
import type { Migration } from './types.js';

export const migrations: Migration[] = [
  initialSchema,
  rateLimitHits,
  tenantCompositeKeys,
  customerList,
  jobs,
  priceBook,
  jobAreas,
  estimates,
  estimateLinks,
  locateTickets,
  rollStock,
  invoices,
  processorEvents,
  crewsBookings,
  uploads,
  customerSearchWordsMigration,
  reminders,
  reportIndexes,
  refunds,
];
