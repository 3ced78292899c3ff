import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { CompanySettingsView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { companyKeys } from './company-keys';

/** `GET /api/company`: the active company with every editable detail (the session lacks the address). */
export async function getCompany(signal?: AbortSignal): Promise<CompanySettingsView> {
  const body = await api.get<ItemResponse<CompanySettingsView>>('/company', { signal });
  return body.data;
}

export function companyQueryOptions() {
  return queryOptions({
    queryKey: companyKeys.settings(),
    queryFn: ({ signal }) => getCompany(signal),
  });
}

export function useCompanySettings(): CompanySettingsView {
  return useSuspenseQuery(companyQueryOptions()).data;
}
