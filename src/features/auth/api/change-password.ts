// POST /api/auth/password — a new password while signed in; the other sessions end.
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const changePassword = (input: { currentPassword: string; newPassword: string }) => api.post<void>('/api/auth/password', input);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
