// GET /api/auth/me/notices — which kinds of mail notice the user gets.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { NoticeSettings } from '../../../../shared/schemas/people';

export const getNoticeSettings = () => api.get<NoticeSettings>('/api/auth/me/notices');

export const getNoticeSettingsQueryOptions = () => queryOptions({ queryKey: ['auth', 'me', 'notices'], queryFn: getNoticeSettings });

export const useNoticeSettings = () => useQuery(getNoticeSettingsQueryOptions());
