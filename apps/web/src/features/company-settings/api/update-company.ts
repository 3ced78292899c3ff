import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CompanySettingsView, ItemResponse, UpdateCompanyInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { companyKeys } from './company-keys';

/** `PATCH /api/company`: the active company's details (owner only). */
export async function updateCompany(input: UpdateCompanyInput): Promise<CompanySettingsView> {
  const body = await api.patch<ItemResponse<CompanySettingsView>>('/company', input);
  return body.data;
}

/** The session holds the company too; the caller refreshes it in `onSaved`. */
export function useUpdateCompany(onSaved: (company: CompanySettingsView) => Promise<void> | void) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: updateCompany,
    onSuccess: async (company) => {
      client.setQueryData(companyKeys.settings(), company);
      await onSaved(company);
    },
  });
}
