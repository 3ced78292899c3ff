// What the estimate document prints, as plain data. It is its own shape (not the estimates
// module's rows), so the renderer can be built and tested alone and joined to saved estimates
// with a small adapter; every field is plain JSON, so the input crosses into the worker thread
// by structured cloning unchanged.
import type { LayoutPlan, LayoutPoint } from '@seamwright/takeoff';

/** A calendar date, `YYYY-MM-DD`, as the company's time zone gives it. */
export type DocumentDate = string;

export interface EstimateDocumentCompany {
  name: string;
  /** As it prints: several lines allowed. */
  address: string | null;
  phone: string | null;
  email: string | null;
}

export interface EstimateDocumentLine {
  label: string;
  quantity: number;
  /** As the trade writes it: `sq ft`, `ft`, `bags`, `each`. */
  unit: string;
  unitPriceCents: number;
  amountCents: number;
}

/** One option the customer may choose (a single-option estimate has one tier). */
export interface EstimateDocumentTier {
  name: string;
  lines: EstimateDocumentLine[];
  subtotalCents: number;
  taxCents: number;
  /** Tax included. */
  totalCents: number;
  /** Part of totalCents, due at signing. */
  depositCents: number;
}

/** A saved plan's drawing fields (a saved LayoutPlan satisfies this as it is). */
export type EstimateDocumentPlan = Pick<
  LayoutPlan,
  'grainAngleDeg' | 'pieces' | 'cuts' | 'seamLines'
> &
  Partial<Pick<LayoutPlan, 'orderedSqFt' | 'wastePct'>>;

export interface EstimateDocumentArea {
  name: string;
  areaSqFt: number;
  /**
   * The area's rings in feet (x east, y north), as planned: the outer ring, then holes. Without
   * it the drawing shows the cuts alone.
   */
  outline?: { outer: readonly LayoutPoint[]; holes?: readonly (readonly LayoutPoint[])[] };
  /** Walkways, drawn hatched (feet). */
  trafficPaths?: readonly { points: readonly LayoutPoint[]; widthFt: number }[];
  plan: EstimateDocumentPlan;
}

/** A safety caution (the takeoff's cautions: title and body). */
export interface EstimateDocumentCaution {
  title: string;
  text: string;
}

/** The cancellation notice a covered home sale must carry (TRADE.md §8.2). */
export interface EstimateDocumentCancellationNotice {
  /** When the right ends, in words: "You may cancel until midnight of Tuesday, June 10, 2025." */
  endsOnText: string;
  /** The notice's paragraphs, in order (a string is split at blank lines). */
  body: string | readonly string[];
  /** Defaults to "Notice of cancellation". */
  heading?: string;
  /** The statement that goes beside the buyer's signature. */
  statement?: string;
  /** The lines the buyer fills in to cancel ("Date: ____"). */
  formLines?: readonly string[];
}

export interface EstimateDocumentInput {
  company: EstimateDocumentCompany;
  customer: { name: string; email: string | null };
  /** As it prints: several lines allowed. */
  siteAddress: string;
  jobTitle: string;
  estimate: { number: string; version: number };
  issuedOn: DocumentDate;
  validUntil: DocumentDate;
  /** ISO 4217 code, e.g. `USD`. */
  currency: string;
  notes: string | null;
  terms: string | null;
  tiers: EstimateDocumentTier[];
  /** How tax and totals are rounded, as one sentence for the small print. */
  roundingRule: string;
  areas: EstimateDocumentArea[];
  cautions: EstimateDocumentCaution[];
  cancellationNotice?: EstimateDocumentCancellationNotice | null;
  /** How lengths print: feet and inches, or metres. */
  units: 'imperial' | 'metric';
}
