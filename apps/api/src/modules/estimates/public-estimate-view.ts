// The customer's view of an estimate: what the PDF prints, as JSON, and nothing more (no
// costs, markup, price-book ids, rules or the office's warnings).
import type { PublicEstimateView } from '@seamwright/shared';
import type { EstimateDocument } from './estimate-document.service.js';
import { documentArea, toEstimateDocumentInput } from './estimate-document-input.js';
import { noticeOfPeriod, periodOfSale } from './estimate-cancellation.js';
import type { EstimateAnswerRow } from './estimate-links.repository.js';
import { mainTier } from './estimate-view.js';

/** Feet, x east and y north, as the planner's points. */
const point = (p: readonly [number, number]): [number, number] => [p[0], p[1]];

function cancellationOf(
  doc: EstimateDocument,
  answer: EstimateAnswerRow | null,
  now: Date,
): PublicEstimateView['cancellation'] {
  // An acceptance signed at home carries its own period; otherwise the page tells the buyer
  // what accepting here would mean (online: not covered, see estimate-answer-record.ts).
  const accepted = answer?.kind === 'accepted' ? answer : null;
  const place = accepted && accepted.place !== 'online' ? accepted.place : 'remote';
  const priceCents = mainTier(doc.estimate).totalCents;
  const period = periodOfSale(doc.company, {
    signedAt: accepted?.signedAt ?? now,
    place,
    priceCents,
  });
  const notice = noticeOfPeriod(doc.company, period);
  if (!period.covered || !notice)
    return { applies: false, detail: period.covered ? null : period.detail, notice: null };
  return {
    applies: true,
    detail: null,
    notice: { ...notice.notice, endsOnText: notice.endsOnText },
  };
}

export function toPublicEstimateView(
  doc: EstimateDocument,
  answer: EstimateAnswerRow | null,
  now = new Date(),
): PublicEstimateView {
  const input = toEstimateDocumentInput(doc, now);
  const status = doc.estimate.status === 'draft' ? 'sent' : doc.estimate.status;
  return {
    company: input.company,
    customer: { name: doc.customer.name },
    siteAddress: input.siteAddress,
    jobTitle: input.jobTitle,
    number: input.estimate.number,
    version: input.estimate.version,
    status,
    issuedOn: input.issuedOn,
    validUntil: input.validUntil,
    currency: input.currency,
    notes: input.notes,
    tiers: doc.estimate.tiers.map((tier) => ({
      id: tier.id,
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
    })),
    chosenTierId: doc.estimate.chosenTierId,
    roundingRule: input.roundingRule,
    areas: doc.areas.map((area) => {
      const drawn = documentArea(area);
      return {
        name: drawn.name,
        areaSqFt: drawn.areaSqFt,
        outline: drawn.outline
          ? {
              outer: drawn.outline.outer.map(point),
              holes: (drawn.outline.holes ?? []).map((h) => h.map(point)),
            }
          : null,
        trafficPaths: (drawn.trafficPaths ?? []).map((t) => ({
          points: t.points.map(point),
          widthFt: t.widthFt,
        })),
        plan: {
          grainAngleDeg: area.plan.grainAngleDeg,
          pieces: area.plan.pieces,
          cuts: area.plan.cuts,
          seamLines: area.plan.seamLines,
          orderedSqFt: area.plan.orderedSqFt,
          wastePct: area.plan.wastePct,
        },
      };
    }),
    cautions: input.cautions,
    units: input.units,
    cancellation: cancellationOf(doc, answer, now),
    answer: answer
      ? {
          kind: answer.kind,
          at: answer.signedAt.toISOString(),
          cancellationEndsAt: answer.cancellationEndsAt?.toISOString() ?? null,
        }
      : null,
  };
}
