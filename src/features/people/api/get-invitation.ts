// GET /api/invitations/:token — what an invitation link offers (no sign-in needed).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { InvitationView } from '../../../../shared/schemas/people';

export const getInvitation = (token: string) => api.get<InvitationView>(`/api/invitations/${encodeURIComponent(token)}`);

export const getInvitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitation(token), retry: false });

export const useInvitation = (token: string) => useQuery(getInvitationQueryOptions(token));
