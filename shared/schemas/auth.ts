import { z } from 'zod';
import { plainText } from './plain-text';
import { NewPassword } from './password';

/** An address as one person: trimmed, Unicode NFKC, lower case, so "Ｆarmer@X " and "farmer@x" are one address. */
export const normaliseEmail = (email: string) => email.trim().normalize('NFKC').toLowerCase();
export const Email = z
  .string({ error: 'email must be text' })
  .max(254, 'email must be at most 254 characters')
  .transform(normaliseEmail)
  .pipe(z.email('email must be an e-mail address'));
export const Login = z.object({ email: Email, password: z.string().min(1, 'password is required') });
export type Login = z.infer<typeof Login>;

export const Register = z.object({
  email: Email,
  password: NewPassword,
  name: plainText('name', 120, 'name is required'),
  farmName: plainText('farmName', 120, 'farm name is required'),
});
export type Register = z.infer<typeof Register>;
/** POST /api/auth/register answers this, whether or not the address already has an account. */
export const REGISTER_ANSWER = 'Check your mail: a link to finish creating the account is on its way. It works for a day.';
/** POST /api/auth/register/confirm: the token from the mailed link. */
export const RegisterConfirm = z.object({ token: z.string({ error: 'token must be text' }).min(20, 'token is not an account link').max(100, 'token is not an account link') });

export const Units = z.enum(['ha', 'ac']);
export type Units = z.infer<typeof Units>;
export const UpdateMe = z.object({ units: Units.optional(), name: plainText('name', 120).optional() });

export type Role = 'farmer' | 'advisor' | 'landowner';
export type User = { id: number; email: string; name: string; units: Units; isAdmin: boolean };
export type FarmSummary = { id: number; name: string; role: Role };
export type Farm = FarmSummary & {
  /** [west, south, east, north] of the farm's fields, or null when it has none. */
  bbox: [number, number, number, number] | null;
  members: { membershipId: number; userId: number; name: string; role: Role }[];
};
export type ApiError = { error: string; message: string; details?: unknown };
