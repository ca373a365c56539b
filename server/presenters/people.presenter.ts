// People of a farm and open invitations as the API shows them.
import type { OpenInvitation, Person } from '../../shared/schemas/people';
import type { Invitation, Membership, User } from '../models';

export const presentInvitation = (inv: Invitation, invitedBy: string | null): OpenInvitation => ({
  id: inv.id,
  email: inv.email,
  role: inv.role,
  fieldIds: inv.fieldIds,
  expiresAt: inv.expiresAt.toISOString(),
  invitedBy,
});

export function presentPeople(memberships: (Membership & { user: User })[], owned: { id: number; ownerMembershipId: number }[], callerUserId: number): Person[] {
  const fieldsOf = new Map<number, number[]>();
  for (const f of owned) fieldsOf.set(f.ownerMembershipId, [...(fieldsOf.get(f.ownerMembershipId) ?? []), f.id]);
  return memberships.map((m) => ({
    membershipId: m.id,
    userId: m.userId,
    name: m.user.name,
    email: m.user.email,
    role: m.role,
    fieldIds: fieldsOf.get(m.id) ?? [],
    isYou: m.userId === callerUserId,
  }));
}
