// People on a farm, invitations, passwords and notices: payloads shared by the forms and the API.
import { z } from 'zod';
import { Email } from './auth';
import { plainText } from './plain-text';
import { NewPassword } from './password';
import type { Role } from './auth';

export const RoleChoice = z.enum(['farmer', 'advisor', 'landowner'], { error: 'role must be farmer, advisor or landowner' });
const FieldIds = z.array(z.number().int().positive(), { error: 'fieldIds must be a list of field ids' }).max(500);

const landownerHasFields = (v: { role: Role; fieldIds?: number[] }) => v.role !== 'landowner' || (v.fieldIds?.length ?? 0) > 0;
const onlyLandownerHasFields = (v: { role: Role; fieldIds?: number[] }) => v.role === 'landowner' || !v.fieldIds?.length;
const RoleAndFields = z
  .object({ role: RoleChoice, fieldIds: FieldIds.optional() })
  .refine(landownerHasFields, { path: ['fieldIds'], message: 'choose at least one field for a landowner' })
  .refine(onlyLandownerHasFields, { path: ['fieldIds'], message: 'only a landowner is given fields' });

/** POST /api/farms/:farmId/invitations. A landowner is invited with the fields that are theirs. */
export const InvitationCreate = z.object({ email: Email }).and(RoleAndFields);
export type InvitationCreate = z.infer<typeof InvitationCreate>;

/** PATCH /api/farms/:farmId/people/:membershipId: a new role, and a landowner's fields. */
export const MembershipUpdate = RoleAndFields;
export type MembershipUpdate = z.infer<typeof MembershipUpdate>;

/** POST /api/invitations/:token/accept: a name and new password, or the password of the account the address has. */
export const InvitationAccept = z.object({ name: plainText('name', 120, 'name is required').optional(), password: z.string().min(1, 'password is required').max(200) });
export type InvitationAccept = z.infer<typeof InvitationAccept>;

export { NewPassword };

export const ForgotPassword = z.object({ email: Email });
export const ResetPassword = z.object({ token: z.string().min(20, 'token is not a reset link').max(100), password: NewPassword });
export const ChangePassword = z.object({ currentPassword: z.string().min(1, 'currentPassword is required'), newPassword: NewPassword });

export const NOTICE_KINDS = ['plan-submitted', 'plan-returned', 'plan-approved', 'action-reminder', 'advisor-digest'] as const;
export const NoticeKind = z.enum(NOTICE_KINDS);
export type NoticeKind = z.infer<typeof NoticeKind>;
/** PUT /api/auth/me/notices: { kind: on/off } for the kinds to change. */
export const NoticeSettingsUpdate = z.partialRecord(NoticeKind, z.boolean({ error: 'each notice is true (on) or false (off)' }));
export type NoticeSettingsUpdate = z.infer<typeof NoticeSettingsUpdate>;

export type Person = { membershipId: number; userId: number; name: string; email: string; role: Role; fieldIds: number[]; isYou: boolean };
export type OpenInvitation = { id: number; email: string; role: Role; fieldIds: number[]; expiresAt: string; invitedBy: string | null };
export type People = { people: Person[]; invitations: OpenInvitation[] };
export type InvitationView = { email: string; role: Role; farmName: string; invitedBy: string | null; expiresAt: string; hasAccount: boolean };
export type NoticeSettings = { kind: NoticeKind; enabled: boolean }[];
export type MailboxMessage = { id: number; to: string; subject: string; text: string; html: string; sentAt: string };
