import { useMutation } from '@tanstack/react-query';
import type { CompanyView, ItemResponse, UpdateCompanyInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';

/** `PATCH /api/company`: the active company's details (owner only). */
export async function updateCompany(input: UpdateCompanyInput): Promise<CompanyView> {
  const body = await api.patch<ItemResponse<CompanyView>>('/company', input);
  return body.data;
}

/** The session holds the company too; the caller refreshes it in `onSaved`. */
export function useUpdateCompany(onSaved: (company: CompanyView) => Promise<void> | void) {
  return useMutation({ mutationFn: updateCompany, onSuccess: onSaved });
}
