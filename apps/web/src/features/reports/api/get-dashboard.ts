import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { DashboardView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { reportKeys } from './report-keys';

/** `GET /api/reports/dashboard?from&to&crewId` (query as built by periodQuery). */
export async function getDashboard(query: string, signal?: AbortSignal): Promise<DashboardView> {
  return (await api.get<ItemResponse<DashboardView>>(`/reports/dashboard${query}`, { signal }))
    .data;
}

export function dashboardQueryOptions(query: string) {
  return queryOptions({
    queryKey: reportKeys.dashboard(query),
    queryFn: ({ signal }) => getDashboard(query, signal),
  });
}

export function useDashboard(query: string): DashboardView {
  return useSuspenseQuery(dashboardQueryOptions(query)).data;
}
