import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { InvoiceView, ItemResponse } from '@seamwright/shared';
import { env } from '../../../config/env';
import { api } from '../../../lib/api-client';
import { invoiceKeys } from './invoice-keys';

/** `GET /api/invoices/:id`: lines, payments, credit notes and links. */
export async function getInvoice(id: string, signal?: AbortSignal): Promise<InvoiceView> {
  const body = await api.get<ItemResponse<InvoiceView>>(`/invoices/${encodeURIComponent(id)}`, {
    signal,
  });
  return body.data;
}

export function invoiceQueryOptions(id: string) {
  return queryOptions({
    queryKey: invoiceKeys.detail(id),
    queryFn: ({ signal }) => getInvoice(id, signal),
  });
}

export function useInvoice(id: string): InvoiceView {
  return useSuspenseQuery(invoiceQueryOptions(id)).data;
}

/** The invoice's PDF (an attachment; the session cookie goes with a plain link). */
export function invoicePdfUrl(id: string): string {
  return `${env.apiBaseUrl}/invoices/${encodeURIComponent(id)}/pdf`;
}
