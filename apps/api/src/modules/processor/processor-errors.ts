// What a call to the processor can end in, as types the callers can switch on: unreachable
// (down, timed out, 5xx, rate limited: nothing was recorded, try later) or refused (it
// answered that the request itself is wrong). Callers map them to problem+json with
// `processorProblem`.
import Stripe from 'stripe';
import { AppError } from '../../errors.js';

/** The processor could not be reached or did not answer in time; nothing was recorded. */
export class ProcessorUnavailableError extends Error {
  constructor(cause: unknown) {
    super('The payment processor cannot be reached right now', { cause });
    this.name = 'ProcessorUnavailableError';
  }
}

/** The processor answered and refused the request (a 4xx other than rate limiting). */
export class ProcessorRefusedError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly code: string | null,
    readonly param: string | null,
  ) {
    super(message);
    this.name = 'ProcessorRefusedError';
  }
}

function isUnavailable(error: InstanceType<typeof Stripe.errors.StripeError>): boolean {
  if (error instanceof Stripe.errors.StripeConnectionError) return true;
  if (error instanceof Stripe.errors.StripeRateLimitError) return true;
  if (error instanceof Stripe.errors.StripeAuthenticationError) return false;
  return error.statusCode === undefined || error.statusCode >= 500;
}

/** Runs one SDK call and turns its failures into the two errors above. */
export async function callProcessor<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (!(error instanceof Stripe.errors.StripeError)) throw new ProcessorUnavailableError(error);
    if (isUnavailable(error)) throw new ProcessorUnavailableError(error);
    throw new ProcessorRefusedError(
      error.message,
      error.statusCode ?? 400,
      error.code ?? null,
      error.param ?? null,
    );
  }
}

/**
 * The answer for a failed processor call. Unavailable: 503 saying nothing was recorded.
 * Refused: 500, because our own request was wrong (a bad key, a parameter we built), which the
 * error log should show; a caller that knows better (an amount under the minimum) maps it first.
 */
export function processorProblem(error: unknown): AppError | undefined {
  if (error instanceof ProcessorUnavailableError)
    return new AppError(
      'PROCESSOR_UNAVAILABLE',
      'The payment processor cannot be reached right now, so nothing was charged or recorded. Try again in a few minutes.',
      { headers: { 'Retry-After': '30' } },
    );
  return undefined;
}
