// bcryptjs hashing. The cost comes from the environment: 12 in production, 4 in tests.
import { randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

export interface DecoyPassword {
  /** The decoy's hash; its `$2b$NN$` prefix shows the cost. */
  hash: string;
  /** Costs as much as checking a real password, and never matches. */
  verify(password: string): Promise<false>;
}

/**
 * A hash to compare against when the e-mail is unknown, so that answer takes as long as a wrong
 * password. It must use the same cost as real hashes (a cheaper decoy makes unknown e-mails
 * answer faster), so it is built once at start-up from `env.bcryptCost`; that takes as long as
 * one real hash. The secret is random, so nothing can ever match it.
 */
function createDecoyPassword(cost: number): DecoyPassword {
  const hash = bcrypt.hashSync(randomBytes(18).toString('base64url'), cost);
  return {
    hash,
    async verify(password) {
      await bcrypt.compare(password, hash);
      return false;
    },
  };
}

const decoys = new Map<number, DecoyPassword>();

/** The decoy for `cost`, built on first use (at start-up, by the auth service) and then reused. */
export function decoyPasswordFor(cost: number): DecoyPassword {
  let decoy = decoys.get(cost);
  if (!decoy) {
    decoy = createDecoyPassword(cost);
    decoys.set(cost, decoy);
  }
  return decoy;
}
