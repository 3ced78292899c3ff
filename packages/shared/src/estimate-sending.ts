import { z } from 'zod';
import { optionalEmailSchema, optionalText, requiredText } from './text.js';

// Sending an estimate, the customer's page (no account) and the customer's answer.

/** `POST /api/estimates/:id/send`: `to` defaults to the customer's e-mail. */
export const sendEstimateInputSchema = z.object({ to: optionalEmailSchema }).strict();
export type SendEstimateData = z.output<typeof sendEstimateInputSchema>;

/** `POST /api/public/estimates/:token/accept`: the buyer types their name. */
export const acceptEstimateInputSchema = z
  .object({
    name: requiredText('Your name', 200),
    tierId: z.string().trim().min(1).max(36).nullish(),
  })
  .strict();
export type AcceptEstimateData = z.output<typeof acceptEstimateInputSchema>;

export const declineEstimateInputSchema = z.object({ reason: optionalText(2000) }).strict();
export type DeclineEstimateData = z.output<typeof declineEstimateInputSchema>;

/** Where a paper acceptance was signed. */
export const signedPlaces = ['home', 'office'] as const;

/** `POST /api/estimates/:id/acceptances`: a signature on paper, recorded by the office. */
export const recordAcceptanceInputSchema = z
  .object({
    name: requiredText('Name', 200),
    signedAt: z.iso.datetime({
      offset: true,
      error: 'Use a date and time with its offset, like 2025-06-06T15:30:00-06:00',
    }),
    place: z.enum(signedPlaces, { error: 'Choose home or office' }),
    tierId: z.string().trim().min(1).max(36).nullish(),
  })
  .strict();
export type RecordAcceptanceData = z.output<typeof recordAcceptanceInputSchema>;

/** What an acceptance answers (`cancellationEndsAt` is null when the sale is not covered). */
export interface EstimateAcceptanceView {
  acceptedAt: string;
  cancellationEndsAt: string | null;
}

export interface PublicEstimateLine {
  label: string;
  quantity: number;
  unit: string;
  unitPriceCents: number;
  amountCents: number;
}

export interface PublicEstimateTier {
  id: string;
  name: string;
  lines: PublicEstimateLine[];
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
}

export interface PublicEstimateArea {
  name: string;
  areaSqFt: number;
  /** Feet, `[x, y]` with x east and y north (the planner's frame). */
  outline: { outer: [number, number][]; holes: [number, number][][] } | null;
  trafficPaths: { points: [number, number][]; widthFt: number }[];
  /** The saved plan's drawing fields. */
  plan: Record<string, unknown>;
}

/**
 * `GET /api/public/estimates/:token`: what the customer sees. Only what the PDF prints: never
 * costs, markup, price-book ids or the office's warnings.
 */
export interface PublicEstimateView {
  company: { name: string; address: string | null; phone: string | null; email: string | null };
  customer: { name: string };
  siteAddress: string;
  jobTitle: string;
  number: string;
  version: number;
  status: 'sent' | 'accepted' | 'declined' | 'superseded';
  issuedOn: string;
  validUntil: string;
  currency: string;
  notes: string | null;
  tiers: PublicEstimateTier[];
  /** Null until the customer (or the office) chose one; the page asks when there are several. */
  chosenTierId: string | null;
  roundingRule: string;
  areas: PublicEstimateArea[];
  cautions: { title: string; text: string }[];
  units: 'imperial' | 'metric';
  /** Whether accepting here is covered by a cancellation rule, and the notice when it is. */
  cancellation: {
    applies: boolean;
    /** Why not, in words, when it does not apply. */
    detail: string | null;
    notice: {
      heading: string;
      statement: string;
      paragraphs: string[];
      formLines: string[];
      endsOnText: string;
    } | null;
  };
  answer: { kind: 'accepted' | 'declined'; at: string; cancellationEndsAt: string | null } | null;
}
