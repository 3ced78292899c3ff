// One-time tokens for e-mailed links: the raw value goes only into the link; the database keeps
// its SHA-256, so a leaked table cannot be replayed.
import { createHash, randomBytes } from 'node:crypto';

export function createOneTimeToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
