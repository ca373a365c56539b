// Forgotten and changed passwords. "Forgot" answers the same whether or not the address has an
// account (and whether or not a limit held the mail back); a new password ends every other
// session of the user at once.
import bcrypt from 'bcryptjs';
import type { Sequelize } from 'sequelize';
import type { Config } from '../../config';
import { PasswordReset, User, UserSession } from '../../models';
import { gone, HttpError, notFound } from '../../lib/http-error';
import { recordEvent } from '../audit';
import { hashPassword } from '../auth.service';
import { queueMail } from '../mail/outbox';
import { passwordResetMail } from '../mail/mail-templates';
import { hashToken, newToken } from '../one-time-token';
import { RESET_MINUTES, RESETS_PER_ACCOUNT_PER_HOUR } from './abuse-limits';

/** POST /api/auth/forgot: mails a one-time link when the address has an account and is under its limit. */
export async function forgotPassword(sequelize: Sequelize, config: Pick<Config, 'publicUrl'>, email: string): Promise<void> {
  const user = await User.findOne({ where: { email }, attributes: ['id', 'name', 'email'] });
  if (!user) return;
  if ((await PasswordReset.countFor(user.id, new Date(Date.now() - 3600 * 1000))) >= RESETS_PER_ACCOUNT_PER_HOUR) return;
  const { token, hash } = newToken();
  await sequelize.transaction(async (t) => {
    // Only the newest link works.
    await PasswordReset.closeOpenOf(user.id, t);
    await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + RESET_MINUTES * 60 * 1000) }, { transaction: t });
    const mail = passwordResetMail({ name: user.name, link: `${config.publicUrl}/reset-password?token=${encodeURIComponent(token)}`, validMinutes: RESET_MINUTES });
    await queueMail({ to: user.email, kind: 'password-reset', userId: user.id }, mail, t);
  });
}

/** POST /api/auth/reset: the new password, every session of the user ended; gives the user to sign in. */
export async function resetPassword(sequelize: Sequelize, token: string, password: string): Promise<User> {
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (t) => {
    const reset = await PasswordReset.byTokenHash(hashToken(token), t);
    if (!reset) throw notFound('That reset link');
    if (reset.usedAt) throw gone('reset_used', 'This link has been used, or a newer one was sent; ask for a new one.');
    if (reset.expiresAt.getTime() <= Date.now()) throw gone('reset_expired', 'This link has expired; ask for a new one.');
    const user = (await User.findByPk(reset.userId, { transaction: t }))!;
    await user.update({ passwordHash }, { transaction: t });
    await PasswordReset.closeOpenOf(user.id, t);
    await UserSession.endAllOf(user.id, null, t);
    await recordEvent({ userId: user.id, farmId: null, entity: 'user', entityId: user.id, action: 'password-reset' }, t);
    return user;
  });
}

/** POST /api/auth/password: checks the current password, sets the new one, ends the user's other sessions. */
export async function changePassword(sequelize: Sequelize, user: User, keepSessionHash: string, input: { currentPassword: string; newPassword: string }): Promise<void> {
  const full = (await User.findByPk(user.id))!;
  if (!(await bcrypt.compare(input.currentPassword, full.passwordHash))) {
    throw new HttpError(400, 'invalid_input', 'currentPassword: that is not your current password', { issues: [{ path: 'currentPassword', message: 'that is not your current password' }] });
  }
  const passwordHash = await hashPassword(input.newPassword);
  await sequelize.transaction(async (t) => {
    await full.update({ passwordHash }, { transaction: t });
    await UserSession.endAllOf(user.id, keepSessionHash, t);
    await recordEvent({ userId: user.id, farmId: null, entity: 'user', entityId: user.id, action: 'password-changed' }, t);
  });
}
