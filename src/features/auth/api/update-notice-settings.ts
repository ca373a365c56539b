// PUT /api/auth/me/notices — turns kinds of notice on or off.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { NoticeSettings, NoticeSettingsUpdate } from '../../../../shared/schemas/people';
import { getNoticeSettingsQueryOptions } from './get-notice-settings';

export const updateNoticeSettings = (input: NoticeSettingsUpdate) => api.put<NoticeSettings>('/api/auth/me/notices', input);

export function useUpdateNoticeSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNoticeSettings,
    onSuccess: (settings) => queryClient.setQueryData(getNoticeSettingsQueryOptions().queryKey, settings),
  });
}
