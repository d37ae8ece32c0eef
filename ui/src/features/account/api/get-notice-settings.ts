import { queryOptions, useQuery } from '@tanstack/react-query';
import type { NoticeSettings } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/me/notifications: which kinds of notice the user turned off (a missing kind is on). */
export async function getNoticeSettings(signal?: AbortSignal): Promise<NoticeSettings> {
  const { notices } = await api.get<{ notices: NoticeSettings }>('/me/notifications', { signal });
  return notices;
}

export const noticeSettingsQueryKey = ['me', 'notifications'] as const;

export function getNoticeSettingsQueryOptions() {
  return queryOptions({ queryKey: noticeSettingsQueryKey, queryFn: ({ signal }) => getNoticeSettings(signal) });
}

export function useNoticeSettings() {
  return useQuery(getNoticeSettingsQueryOptions());
}
