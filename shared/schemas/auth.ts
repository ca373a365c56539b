import { z } from 'zod';
import { plainText } from './plain-text';

export const Email = z.string().trim().toLowerCase().email('email must be an e-mail address');
export const Login = z.object({ email: Email, password: z.string().min(1, 'password is required') });
export type Login = z.infer<typeof Login>;

export const Register = z.object({
  email: Email,
  password: z.string().min(10, 'password must be at least 10 characters').max(200),
  name: plainText('name', 120, 'name is required'),
  farmName: plainText('farmName', 120, 'farm name is required'),
});
export type Register = z.infer<typeof Register>;

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
