// POST /api/auth/forgot — mails a one-time link to choose a new password (same answer for any address).
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const forgotPassword = (email: string) => api.post<{ ok: true; message: string }>('/api/auth/forgot', { email });

export const useForgotPassword = () => useMutation({ mutationFn: forgotPassword });
