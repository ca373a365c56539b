// Creating an account by mail. "Create an account" answers the same whatever the address: a new
// address gets a one-time link that finishes the account; an address that has an account gets a
// notice that someone tried, with links to sign in or choose a new password. Either way the
// answer tells nobody whether the address has an account.
import { UniqueConstraintError, type Sequelize } from 'sequelize';
import type { Config } from '../../config';
import { Farm, Membership, RegistrationRequest, User } from '../../models';
import type { Register } from '../../../shared/schemas/auth';
import { conflict, gone, notFound } from '../../lib/http-error';
import { recordEvent } from '../audit';
import { hashPassword } from '../auth.service';
import { queueMail } from '../mail/outbox';
import { accountExistsMail, confirmAccountMail } from '../mail/mail-templates';
import { hashToken, newToken } from '../one-time-token';
import { REGISTRATION_HOURS, REGISTRATIONS_PER_ADDRESS_PER_HOUR } from './abuse-limits';

/** POST /api/auth/register: mails the address a link (or a notice); past the address's limit, sends nothing. */
export async function requestRegistration(sequelize: Sequelize, config: Pick<Config, 'publicUrl'>, input: Register): Promise<void> {
  // Hashed whatever the address, so the answer takes as long either way.
  const passwordHash = await hashPassword(input.password);
  await sequelize.transaction(async (t) => {
    await RegistrationRequest.lockAddress(input.email, t);
    if ((await RegistrationRequest.countFor(input.email, new Date(Date.now() - 3600 * 1000), t)) >= REGISTRATIONS_PER_ADDRESS_PER_HOUR) return;
    const expiresAt = new Date(Date.now() + REGISTRATION_HOURS * 3600 * 1000);
    const owner = await User.findOne({ where: { email: input.email }, attributes: ['id', 'name', 'email'], transaction: t });
    if (owner) {
      await RegistrationRequest.create({ email: input.email, name: input.name, farmName: input.farmName, passwordHash: null, tokenHash: null, expiresAt }, { transaction: t });
      const mail = accountExistsMail({ name: owner.name, signInLink: `${config.publicUrl}/sign-in`, resetLink: `${config.publicUrl}/forgot-password` });
      await queueMail({ to: owner.email, kind: 'registration-attempt', userId: owner.id }, mail, t);
      return;
    }
    const { token, hash } = newToken();
    await RegistrationRequest.create({ email: input.email, name: input.name, farmName: input.farmName, passwordHash, tokenHash: hash, expiresAt }, { transaction: t });
    const link = `${config.publicUrl}/confirm-account?token=${encodeURIComponent(token)}`;
    await queueMail({ to: input.email, kind: 'registration' }, confirmAccountMail({ name: input.name, farmName: input.farmName, link, validHours: REGISTRATION_HOURS }), t);
  });
}

/** POST /api/auth/register/confirm: the account and its farm, with the person as farmer. */
export async function confirmRegistration(sequelize: Sequelize, token: string): Promise<User> {
  try {
    return await sequelize.transaction(async (t) => {
      const request = await RegistrationRequest.byTokenHash(hashToken(token), t);
      if (!request || !request.passwordHash) throw notFound('That link');
      if (request.usedAt) throw gone('registration_used', 'This link has been used; sign in instead.');
      if (request.expiresAt.getTime() <= Date.now()) throw gone('registration_expired', 'This link has expired; create the account again.');
      await RegistrationRequest.closeOpenOf(request.email, t);
      const user = await User.create({ email: request.email, name: request.name, passwordHash: request.passwordHash }, { transaction: t });
      const farm = await Farm.create({ name: request.farmName }, { transaction: t });
      await Membership.create({ userId: user.id, farmId: farm.id, role: 'farmer' }, { transaction: t });
      await recordEvent({ userId: user.id, farmId: farm.id, entity: 'farm', entityId: farm.id, action: 'created' }, t);
      return user;
    });
  } catch (e) {
    // The address got an account since the link was sent (an invitation accepted meanwhile).
    if (e instanceof UniqueConstraintError) throw conflict('email_taken', 'This address has an account now; sign in instead.');
    throw e;
  }
}
