import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { NoticeSettings } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { noticeSettingsQueryKey } from './get-notice-settings';

/** PUT /api/me/notifications: sets the kinds given (true: send, false: do not send); answers with all settings. */
export async function saveNoticeSettings(change: NoticeSettings): Promise<NoticeSettings> {
  const { notices } = await api.put<{ notices: NoticeSettings }>('/me/notifications', change);
  return notices;
}

export function useSaveNoticeSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveNoticeSettings,
    onMutate: async (change) => {
      await queryClient.cancelQueries({ queryKey: noticeSettingsQueryKey });
      const before = queryClient.getQueryData<NoticeSettings>(noticeSettingsQueryKey);
      queryClient.setQueryData<NoticeSettings>(noticeSettingsQueryKey, { ...before, ...change });
      return { before };
    },
    onError: (_error, _change, context) => queryClient.setQueryData(noticeSettingsQueryKey, context?.before),
    onSuccess: (notices) => queryClient.setQueryData(noticeSettingsQueryKey, notices),
  });
}
