// Inviting people to a farm by e-mail, and answering the link: a new account (name and password)
// or the password of the account the address has; either way the person joins the farm with the
// invited role (a landowner with their fields) and is signed in.
import bcrypt from 'bcryptjs';
import type { Sequelize } from 'sequelize';
import type { Config } from '../../config';
import type { InvitationAccept, InvitationCreate, InvitationView, OpenInvitation } from '../../../shared/schemas/people';
import { NewPassword } from '../../../shared/schemas/people';
import { Farm, Field, Invitation, Membership, User } from '../../models';
import { badRequest, conflict, gone, HttpError, notFound, tooMany } from '../../lib/http-error';
import { presentInvitation } from '../../presenters/people.presenter';
import { recordEvent } from '../audit';
import { hashPassword } from '../auth.service';
import { queueMail } from '../mail/outbox';
import { invitationMail } from '../mail/mail-templates';
import { hashToken, newToken } from '../one-time-token';
import { INVITATION_DAYS, INVITES_PER_ADDRESS_PER_DAY, INVITES_PER_SENDER_PER_HOUR } from './abuse-limits';

const HOUR_MS = 3600 * 1000;

async function checkLimits(senderId: number, email: string): Promise<void> {
  if ((await Invitation.countSentBy(senderId, new Date(Date.now() - HOUR_MS))) >= INVITES_PER_SENDER_PER_HOUR) {
    throw tooMany('too_many_invitations', `You have sent ${INVITES_PER_SENDER_PER_HOUR} invitations in the last hour; wait a while before sending more.`);
  }
  if ((await Invitation.countSentTo(email, new Date(Date.now() - 24 * HOUR_MS))) >= INVITES_PER_ADDRESS_PER_DAY) {
    throw tooMany('too_many_invitations', `${email} has had ${INVITES_PER_ADDRESS_PER_DAY} invitations today; try again tomorrow.`);
  }
}

/** POST /api/farms/:farmId/invitations (farmer): sends the invitation mail with a one-time link. */
export async function invite(sequelize: Sequelize, config: Pick<Config, 'publicUrl'>, actor: { userId: number; name: string }, farmId: number, input: InvitationCreate): Promise<OpenInvitation> {
  const existing = await User.findOne({ where: { email: input.email }, attributes: ['id'] });
  if (existing && (await Membership.findOne({ where: { userId: existing.id, farmId }, attributes: ['id'] }))) {
    throw conflict('already_member', `${input.email} is already a member of this farm; change their role instead.`);
  }
  const fieldIds = [...new Set(input.fieldIds ?? [])];
  if (fieldIds.length && (await Field.countOfFarm(farmId, fieldIds)) !== fieldIds.length) {
    throw badRequest('invalid_input', 'fieldIds: every field must be a field of this farm', { issues: [{ path: 'fieldIds', message: 'every field must be a field of this farm' }] });
  }
  await checkLimits(actor.userId, input.email);
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * HOUR_MS);
  return sequelize.transaction(async (t) => {
    await Invitation.cancelOpen(farmId, input.email, t);
    const inv = await Invitation.create({ farmId, email: input.email, role: input.role, fieldIds, tokenHash: hash, invitedBy: actor.userId, expiresAt }, { transaction: t });
    const farm = (await Farm.findByPk(farmId, { attributes: ['name'], transaction: t }))!;
    const mail = invitationMail({ farmName: farm.name, role: input.role, invitedBy: actor.name, link: `${config.publicUrl}/invitations/${token}`, expiresAt });
    await queueMail({ to: input.email, kind: 'invitation', userId: existing?.id ?? null, farmId }, mail, t);
    await recordEvent({ userId: actor.userId, farmId, entity: 'invitation', entityId: inv.id, action: 'created', detail: { role: input.role, fieldIds } }, t);
    return presentInvitation(inv, actor.name);
  });
}

/** DELETE /api/farms/:farmId/invitations/:id (farmer): the link stops working. */
export async function cancelInvitation(sequelize: Sequelize, actor: { userId: number }, farmId: number, invitationId: number): Promise<void> {
  await sequelize.transaction(async (t) => {
    const inv = await Invitation.findOne({ where: { id: invitationId, farmId, acceptedAt: null, cancelledAt: null }, transaction: t });
    if (!inv) throw notFound('That open invitation');
    await inv.update({ cancelledAt: new Date() }, { transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'invitation', entityId: inv.id, action: 'cancelled' }, t);
  });
}

/** Why a link no longer works, in words; null while it works. */
function closedReason(inv: Invitation): HttpError | null {
  if (inv.acceptedAt) return gone('invitation_used', 'This invitation has been accepted already; sign in to open the farm.');
  if (inv.cancelledAt) return gone('invitation_cancelled', 'This invitation was withdrawn or replaced by a newer one; ask the farmer for a new one.');
  if (inv.expiresAt.getTime() <= Date.now()) return gone('invitation_expired', 'This invitation has expired; ask the farmer to send a new one.');
  return null;
}

/** GET /api/invitations/:token: what the invitation offers, for the page that answers it. */
export async function viewInvitation(token: string): Promise<InvitationView> {
  const inv = await Invitation.byTokenHash(hashToken(token));
  if (!inv) throw notFound('That invitation link');
  const closed = closedReason(inv);
  if (closed) throw closed;
  const hasAccount = !!(await User.findOne({ where: { email: inv.email }, attributes: ['id'] }));
  return { email: inv.email, role: inv.role, farmName: inv.farm?.name ?? '', invitedBy: inv.inviter?.name ?? null, expiresAt: inv.expiresAt.toISOString(), hasAccount };
}

/** POST /api/invitations/:token/accept: joins the farm; gives the user to sign in and the farm. */
export async function acceptInvitation(sequelize: Sequelize, token: string, input: InvitationAccept): Promise<{ user: User; farmId: number }> {
  return sequelize.transaction(async (t) => {
    const inv = await Invitation.byTokenHash(hashToken(token), t);
    if (!inv) throw notFound('That invitation link');
    const closed = closedReason(inv);
    if (closed) throw closed;
    let user = await User.findOne({ where: { email: inv.email }, transaction: t });
    if (user) {
      if (!(await bcrypt.compare(input.password, user.passwordHash))) {
        throw new HttpError(401, 'bad_credentials', `That is not the password of the account for ${inv.email}.`);
      }
    } else {
      if (!input.name) throw badRequest('invalid_input', 'name: name is required', { issues: [{ path: 'name', message: 'name is required' }] });
      const pw = NewPassword.safeParse(input.password);
      if (!pw.success) throw badRequest('invalid_input', `password: ${pw.error.issues[0].message}`, { issues: [{ path: 'password', message: pw.error.issues[0].message }] });
      user = await User.create({ email: inv.email, name: input.name, passwordHash: await hashPassword(pw.data) }, { transaction: t });
    }
    if (await Membership.findOne({ where: { userId: user.id, farmId: inv.farmId }, transaction: t })) {
      throw conflict('already_member', 'You are already a member of this farm.');
    }
    const m = await Membership.create({ userId: user.id, farmId: inv.farmId, role: inv.role }, { transaction: t });
    if (inv.role === 'landowner') {
      // Fields removed from the farm since the invitation went out are simply not given.
      await Field.setOwnedFields(inv.farmId, m.id, inv.fieldIds, t);
    }
    await inv.update({ acceptedAt: new Date(), acceptedBy: user.id }, { transaction: t });
    await recordEvent({ userId: user.id, farmId: inv.farmId, entity: 'membership', entityId: m.id, action: 'joined', detail: { role: inv.role, invitationId: inv.id } }, t);
    return { user, farmId: inv.farmId };
  });
}
