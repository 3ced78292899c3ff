// Object ids shaped like the processor's (a type prefix and random characters), so code that
// looks at a prefix (`cs_test_`, `pi_test_`) behaves as it would against the hosted service.
import { randomBytes } from 'node:crypto';

const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

function randomPart(length: number): string {
  const bytes = randomBytes(length);
  let out = '';
  for (const byte of bytes) out += alphabet[byte % alphabet.length];
  return out;
}

export type IdPrefix = 'cs_test' | 'pi_test' | 'ch_test' | 're' | 'evt' | 'req';

export function newId(prefix: IdPrefix): string {
  return `${prefix}_${randomPart(prefix === 'cs_test' ? 40 : 24)}`;
}

/** Whole seconds since the epoch: every `created` field is in these. */
export function unixNow(): number {
  return Math.floor(Date.now() / 1000);
}
