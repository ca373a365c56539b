import bcrypt from 'bcryptjs';
import { User } from '../models';
import { HttpError } from '../lib/http-error';

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
