import { z } from 'zod';
import { requiredText, type PublicEstimateView } from '@seamwright/shared';
import { ApiError } from '../../../lib/api-error';

/**
 * The accept form: the full name always, and the option when there are several (the API answers
 * a 400 on `tierId` otherwise; asking here says it before the round trip).
 */
export function acceptSchemaFor(tierIds: readonly string[]) {
  return z
    .object({ name: requiredText('Your full name', 200), tierId: z.string() })
    .superRefine((values, ctx) => {
      if (tierIds.length > 1 && !tierIds.includes(values.tierId))
        ctx.addIssue({ code: 'custom', path: ['tierId'], message: 'Choose one of the options' });
    })
    .transform(({ name, tierId }) => ({
      name,
      // One option: that one, without asking.
      tierId: tierIds.length === 1 ? (tierIds[0] ?? null) : tierId || null,
    }));
}

/** What the page shows for an estimate it could read. */
export type EstimatePageState =
  | { kind: 'open' }
  | { kind: 'accepted'; at: string; cancellationEndsAt: string | null }
  | { kind: 'declined'; at: string }
  | { kind: 'replaced' };

export function pageStateOf(view: PublicEstimateView): EstimatePageState {
  if (view.answer?.kind === 'accepted')
    return {
      kind: 'accepted',
      at: view.answer.at,
      cancellationEndsAt: view.answer.cancellationEndsAt,
    };
  if (view.answer?.kind === 'declined') return { kind: 'declined', at: view.answer.at };
  if (view.status === 'superseded') return { kind: 'replaced' };
  return { kind: 'open' };
}

/** A link the page cannot use, in the customer's terms. */
export type DeadLink = 'unknown' | 'expired' | 'answered';

/** 404: unknown or withdrawn; 410: past its date; 409: answered already. Anything else is not a dead link. */
export function deadLinkOf(error: unknown): DeadLink | null {
  if (!(error instanceof ApiError)) return null;
  if (error.status === 404) return 'unknown';
  if (error.status === 410) return 'expired';
  if (error.status === 409) return 'answered';
  return null;
}

export const deadLinkWords: Record<DeadLink, { title: string; text: string }> = {
  unknown: {
    title: 'This estimate link does not work',
    text: 'The link may be mistyped, or the company may have withdrawn it and sent a newer one. Check your e-mail for a newer message, or contact the company.',
  },
  expired: {
    title: 'This estimate has expired',
    text: 'The prices were good until a date that has now passed. Contact the company and ask for a new estimate.',
  },
  answered: {
    title: 'This estimate has already been answered',
    text: 'Someone already accepted or declined it, or the company replaced it with a newer version. Contact the company if that was not you.',
  },
};
