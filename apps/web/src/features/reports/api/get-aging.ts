import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { AgingReportView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { reportKeys } from './report-keys';

/** `GET /api/reports/aging[?asOf]`: what customers owe, by days past due. */
export async function getAging(
  asOf: string | null,
  signal?: AbortSignal,
): Promise<AgingReportView> {
  const query = asOf ? `?asOf=${encodeURIComponent(asOf)}` : '';
  return (await api.get<ItemResponse<AgingReportView>>(`/reports/aging${query}`, { signal })).data;
}

export function agingQueryOptions(asOf: string | null) {
  return queryOptions({
    queryKey: reportKeys.aging(asOf),
    queryFn: ({ signal }) => getAging(asOf, signal),
  });
}

export function useAging(asOf: string | null): AgingReportView {
  return useSuspenseQuery(agingQueryOptions(asOf)).data;
}
