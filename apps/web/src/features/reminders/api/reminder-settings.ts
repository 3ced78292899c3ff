import { queryOptions, useMutation, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import type { ItemResponse, ReminderSettingsData, ReminderSettingsView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';

export const reminderKeys = {
  all: ['reminders'] as const,
  settings: () => [...reminderKeys.all, 'settings'] as const,
};

/** `GET /api/settings/reminders`: the schedule, wording and the standard to go back to. */
export function reminderSettingsQueryOptions() {
  return queryOptions({
    queryKey: reminderKeys.settings(),
    queryFn: async ({ signal }) =>
      (await api.get<ItemResponse<ReminderSettingsView>>('/settings/reminders', { signal })).data,
  });
}

export function useReminderSettings(): ReminderSettingsView {
  return useSuspenseQuery(reminderSettingsQueryOptions()).data;
}

/** `PUT /api/settings/reminders`: the whole settings; the open invoices follow at once. */
export function useSaveReminderSettings() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: ReminderSettingsData) =>
      (await api.put<ItemResponse<ReminderSettingsView>>('/settings/reminders', input)).data,
    onSuccess: (view) => client.setQueryData(reminderKeys.settings(), view),
  });
}
