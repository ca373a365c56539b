import bcrypt from 'bcryptjs';
import type { Sequelize } from 'sequelize';
import { User, Farm, Membership } from '../models';
import type { Register } from '../../shared/schemas/auth';
import { conflict, HttpError } from '../lib/http-error';
import { recordEvent } from './audit';

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, 10);
}

/** The user when email and password match; 401 otherwise, the same answer for either mistake. */
export async function signIn(email: string, password: string): Promise<User> {
  const user = await User.findOne({ where: { email: email.toLowerCase() } });
  // Compare against a dummy hash when there is no user so timing does not tell them apart.
  const ok = await bcrypt.compare(password, user?.passwordHash ?? '$2a$10$abcdefghijklmnopqrstuuWQ4pnn6D6kkXbo.b4CiZ0m0r0Em1uyS');
  if (!user || !ok) throw new HttpError(401, 'bad_credentials', 'That e-mail and password do not match an account.');
  return user;
}

/** The signed-in user's own settings (display units, name). */
export async function updateProfile(user: User, input: { units?: User['units']; name?: string }): Promise<User> {
  return user.update(input);
}

/** A new user with a new farm on which they are the farmer. */
export async function register(sequelize: Sequelize, input: Register): Promise<User> {
  if (await User.findOne({ where: { email: input.email } })) {
    throw conflict('email_taken', 'An account with that e-mail address already exists; sign in instead.');
  }
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
    const farm = await Farm.create({ name: input.farmName }, { transaction });
    await Membership.create({ userId: user.id, farmId: farm.id, role: 'farmer' }, { transaction });
    await recordEvent({ userId: user.id, farmId: farm.id, entity: 'farm', entityId: farm.id, action: 'created' }, transaction);
    return user;
  });
}
