import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import type {
  ItemResponse,
  ListResponse,
  PriceBookImportPreview,
  PriceBookItemInput,
  PriceBookItemView,
  PriceBookListQuery,
  UpdatePriceBookItemInput,
} from '@seamwright/shared';
import { env } from '../../../config/env';
import { api } from '../../../lib/api-client';
import { estimatingKeys } from './estimating-keys';

/** Where the browser downloads the CSV (a plain link: the session cookie goes along). */
export const priceBookExportUrl = `${env.apiBaseUrl}/price-book/export.csv`;

export function priceBookQueryOptions(query: PriceBookListQuery) {
  return queryOptions({
    queryKey: estimatingKeys.priceBookList(query),
    queryFn: ({ signal }) =>
      api.get<ListResponse<PriceBookItemView>>('/price-book', {
        signal,
        query: { page: query.page, pageSize: query.pageSize, kind: query.kind, q: query.q },
      }),
    placeholderData: keepPreviousData,
  });
}

export function usePriceBook(query: PriceBookListQuery) {
  return useQuery(priceBookQueryOptions(query));
}

function useRefreshingMutation<I, O>(mutationFn: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: () => client.invalidateQueries({ queryKey: estimatingKeys.priceBook() }),
  });
}

export function useCreatePriceBookItem() {
  return useRefreshingMutation(
    async (input: PriceBookItemInput) =>
      (await api.post<ItemResponse<PriceBookItemView>>('/price-book', input)).data,
  );
}

export function useUpdatePriceBookItem() {
  return useRefreshingMutation(
    async ({ id, input }: { id: string; input: UpdatePriceBookItemInput }) =>
      (await api.patch<ItemResponse<PriceBookItemView>>(`/price-book/${id}`, input)).data,
  );
}

export function useDeletePriceBookItem() {
  return useRefreshingMutation((id: string) => api.delete<void>(`/price-book/${id}`));
}

/** `POST /api/price-book/import`: a dry run answers the preview; a real run writes all or nothing. */
export function useImportPriceBook() {
  return useRefreshingMutation(
    async (input: { csv: string; dryRun: boolean }) =>
      (await api.post<ItemResponse<PriceBookImportPreview>>('/price-book/import', input)).data,
  );
}
