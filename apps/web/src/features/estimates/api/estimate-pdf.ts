import { env } from '../../../config/env';

/** `GET /api/estimates/:id/pdf` (application/pdf), for a plain link: the session cookie goes along. */
export function estimatePdfUrl(id: string): string {
  return `${env.apiBaseUrl}/estimates/${encodeURIComponent(id)}/pdf`;
}
