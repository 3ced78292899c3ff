// The saved estimate (getEstimateForDocument) as the PDF renderer's input. The PDF goes to the
// customer, so it carries what they pay for only: labels, quantities, unit prices and amounts,
// never costs, markup or price-book ids.
import type { EstimateTier } from '@seamwright/domain';
import type { LayoutPoint } from '@seamwright/takeoff';
import { documentCancellationNotice } from '../estimate-document/index.js';
import type {
  EstimateDocumentArea,
  EstimateDocumentInput,
  EstimateDocumentTier,
} from '../estimate-document/index.js';
import type { EstimateDocument } from './estimate-document.service.js';
import { localDay, noticeOfPeriod, periodOfSale } from './estimate-cancellation.js';

/** When an estimate has no validity date of its own, it is good for this many days. */
export const DEFAULT_VALIDITY_DAYS = 30;

export function estimateNumber(doc: Pick<EstimateDocument, 'estimate'>): string {
  return `E-${doc.estimate.id.slice(0, 8).toUpperCase()}`;
}

export function siteAddress(site: EstimateDocument['site']): string {
  const cityLine = [site.city, [site.region, site.postalCode].filter(Boolean).join(' ')]
    .filter(Boolean)
    .join(', ');
  return [site.addressLine1, site.addressLine2, cityLine].filter(Boolean).join('\n');
}

/** The day the estimate was (or is being) issued and the last day it is good for. */
export function validityOf(
  doc: EstimateDocument,
  now: Date,
): { issuedOn: string; validUntil: string } {
  const issued = doc.estimate.sentAt ? new Date(doc.estimate.sentAt) : now;
  const issuedOn = localDay(issued, doc.company.timeZone);
  const validUntil =
    doc.estimate.validUntil ?? localDay(issued, doc.company.timeZone, DEFAULT_VALIDITY_DAYS);
  return { issuedOn, validUntil };
}

export function documentTier(tier: EstimateTier): EstimateDocumentTier {
  return {
    name: tier.name,
    lines: tier.lines.map((line) => ({
      label: line.label,
      quantity: line.quantity,
      unit: line.unit,
      unitPriceCents: line.unitPriceCents,
      amountCents: line.amountCents,
    })),
    subtotalCents: tier.subtotalCents,
    taxCents: tier.taxCents,
    totalCents: tier.totalCents,
    depositCents: tier.depositCents,
  };
}

interface SavedDrawing {
  area?: { outer?: LayoutPoint[]; holes?: LayoutPoint[][] };
  trafficPaths?: (LayoutPoint[] | { points: LayoutPoint[]; widthFt?: number })[];
}

/** The outline and walkways from the exact planner request saved with the area. */
export function documentArea(area: EstimateDocument['areas'][number]): EstimateDocumentArea {
  const request = area.request as SavedDrawing;
  const outer = request.area?.outer;
  const paths = (request.trafficPaths ?? []).map((path) =>
    Array.isArray(path)
      ? { points: path, widthFt: 3 }
      : { points: path.points, widthFt: path.widthFt ?? 3 },
  );
  return {
    name: area.name,
    areaSqFt: area.areaSqFt,
    ...(outer ? { outline: { outer, holes: request.area?.holes ?? [] } } : {}),
    ...(paths.length > 0 ? { trafficPaths: paths } : {}),
    plan: area.plan,
  };
}

/**
 * The document's input. The notice is printed when the sale would be covered if the buyer
 * signed this document at home today (the paper copy is what is signed at the kitchen table);
 * an online acceptance is not covered (see estimate-answers.service.ts).
 */
export function toEstimateDocumentInput(
  doc: EstimateDocument,
  now = new Date(),
): EstimateDocumentInput {
  const { issuedOn, validUntil } = validityOf(doc, now);
  const chosen = doc.estimate.tiers.find((t) => t.id === doc.estimate.chosenTierId);
  const tiers = chosen ? [chosen] : doc.estimate.tiers;
  // The smallest tier's price decides: if it is covered, every tier is.
  const priceCents = Math.min(...tiers.map((t) => t.totalCents));
  const period = periodOfSale(doc.company, { signedAt: now, place: 'home', priceCents });
  const notice = noticeOfPeriod(doc.company, period);
  return {
    company: { name: doc.company.name, address: doc.company.address, phone: null, email: null },
    customer: { name: doc.customer.name, email: doc.customer.email },
    siteAddress: siteAddress(doc.site),
    jobTitle: doc.job.title,
    estimate: { number: estimateNumber(doc), version: doc.estimate.version },
    issuedOn,
    validUntil,
    currency: doc.company.currency,
    notes: doc.estimate.notes,
    terms: null,
    tiers: tiers.map(documentTier),
    roundingRule: doc.roundingRule,
    areas: doc.areas.map(documentArea),
    cautions: doc.cautions.map((c) => ({ title: c.title, text: c.body })),
    cancellationNotice: notice
      ? documentCancellationNotice(notice.notice, notice.endsOnText)
      : null,
    units: doc.company.measurementSystem,
  };
}
