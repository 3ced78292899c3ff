// The cancellation notice a covered sale must carry, for the customer's page and the PDF. The
// FTC rule (16 CFR §429.1) prescribes what the statement near the signature and the "Notice of
// Cancellation" form say; the wording below follows that content as recalled (from memory, not
// copied from a verified text), so a company should have it checked against the rule and its
// state's law before relying on it.
import { tz } from '@date-fns/tz';
import { format, parseISO } from 'date-fns';
import type { CalendarDate } from '../calendar/calendar.js';

export interface CancellationNoticeInput {
  sellerName: string;
  /** The seller's place of business, as it prints (several lines allowed). */
  sellerAddress: string | null;
  /** The day of the sale, or the day it would be if signed today. */
  saleDate: CalendarDate;
  /** The last day of the period: the buyer may cancel until midnight at its end. */
  lastDay: CalendarDate;
  businessDays: number;
}

export interface CancellationNotice {
  heading: string;
  /** The statement that goes beside the buyer's signature. */
  statement: string;
  /** The notice form's paragraphs, in order. */
  paragraphs: string[];
  /** The lines the buyer fills in to cancel. */
  formLines: string[];
}

const numberWords = ['zero', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight'];
const ordinalWords = ['zeroth', 'first', 'second', 'third', 'fourth', 'fifth', 'sixth', 'seventh'];

/** `2025-06-10` → `Tuesday, June 10, 2025`. */
export function longCalendarDate(date: CalendarDate): string {
  return format(parseISO(date, { in: tz('UTC') }), 'EEEE, MMMM d, yyyy');
}

export function cancellationNotice(input: CancellationNoticeInput): CancellationNotice {
  const n = input.businessDays;
  const days = numberWords[n] ?? String(n);
  const nth = ordinalWords[n] ?? `${n}th`;
  const address = input.sellerAddress?.trim().replace(/\s*\n\s*/g, ', ') || 'its place of business';
  return {
    heading: 'Notice of cancellation',
    statement: `You, the buyer, may cancel this transaction at any time prior to midnight of the ${nth} business day after the date of this transaction. See the notice of cancellation below for an explanation of this right.`,
    paragraphs: [
      `Date of the transaction: ${longCalendarDate(input.saleDate)}.`,
      `You may cancel this transaction, without any penalty or obligation, within ${days} business days from the above date.`,
      'If you cancel, any property traded in, any payments made by you under the contract or sale, and any negotiable instrument executed by you will be returned within 10 business days after the seller receives your cancellation notice, and any security interest arising out of the transaction will be cancelled.',
      'If you cancel, you must make available to the seller at your residence, in substantially as good condition as when received, any goods delivered to you under this contract or sale; or you may, if you wish, follow the seller’s instructions for returning the goods at the seller’s expense and risk.',
      'If you make the goods available to the seller and the seller does not pick them up within 20 days of the date of your notice of cancellation, you may keep or dispose of them without any further obligation. If you fail to make the goods available, or agree to return them and fail to do so, you remain liable for performance of all obligations under the contract.',
      `To cancel this transaction, mail or deliver a signed and dated copy of this cancellation notice, or any other written notice, to ${input.sellerName} at ${address}, not later than midnight of ${longCalendarDate(input.lastDay)}.`,
    ],
    formLines: [
      'I hereby cancel this transaction.',
      'Date: ____________',
      'Buyer’s signature: ____________',
    ],
  };
}
