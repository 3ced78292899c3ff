import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse, MembershipView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { sessionKeys } from './session-keys';

/** `GET /api/me/companies`: every company of the signed-in person; needs no active company. */
export async function getMyCompanies(): Promise<MembershipView[]> {
  const body = await api.get<ListResponse<MembershipView>>('/me/companies');
  return body.data;
}

export function myCompaniesQueryOptions() {
  return queryOptions({ queryKey: sessionKeys.companies(), queryFn: getMyCompanies });
}

export function useMyCompanies() {
  return useQuery(myCompaniesQueryOptions());
}
