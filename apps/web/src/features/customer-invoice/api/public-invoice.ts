import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { ItemResponse, PublicInvoiceView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';

// The customer's pay page has no session: the e-mailed link's token is the only key.
const base = (token: string) => `/public/invoices/${encodeURIComponent(token)}`;

export const publicInvoiceKeys = {
  all: ['public-invoice'] as const,
  view: (token: string) => [...publicInvoiceKeys.all, token] as const,
};

/** `GET /api/public/invoices/:token`. */
export async function getPublicInvoice(token: string): Promise<PublicInvoiceView> {
  return (await api.get<ItemResponse<PublicInvoiceView>>(base(token))).data;
}

export function publicInvoiceQueryOptions(token: string) {
  return queryOptions({
    queryKey: publicInvoiceKeys.view(token),
    queryFn: () => getPublicInvoice(token),
    // A dead link stays dead; asking again only spends the link's rate limit.
    retry: false,
  });
}

/**
 * The invoice, read again every `pollMs` while a payment is being confirmed: the processor
 * tells the server by webhook, which may land a moment after the customer is sent back.
 */
export function usePublicInvoice(token: string, pollMs: number | false) {
  return useQuery({ ...publicInvoiceQueryOptions(token), refetchInterval: pollMs });
}

/** `POST /api/public/invoices/:token/checkout`: where to send the customer to pay. */
export function useStartCheckout(token: string) {
  return useMutation({
    mutationFn: async () =>
      (await api.post<ItemResponse<{ url: string }>>(`${base(token)}/checkout`, {})).data,
  });
}
