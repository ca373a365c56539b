// GET /api/dev/mailbox — what the local fake mail server caught (only while it is in use).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MailboxMessage } from '../../../../shared/schemas/people';

export const getMailbox = () => api.get<MailboxMessage[]>('/api/dev/mailbox');

export const getMailboxQueryOptions = () => queryOptions({ queryKey: ['dev', 'mailbox'], queryFn: getMailbox, retry: false, refetchInterval: 5000 });

export const useMailbox = () => useQuery(getMailboxQueryOptions());
