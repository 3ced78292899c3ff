// bcryptjs hashing. The cost comes from the environment: 12 in production, 4 in tests.
import bcrypt from 'bcryptjs';

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

/** A hash to compare against when the e-mail is unknown, so both answers take as long. */
const decoyHash = bcrypt.hashSync('decoy-password-never-matches', 10);

export async function verifyAgainstDecoy(password: string): Promise<false> {
  await bcrypt.compare(password, decoyHash);
  return false;
}
