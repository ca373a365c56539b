// A user as the API shows them: never the password hash.
import type { User as UserDto } from '../../shared/schemas/auth';
import type { User } from '../models';

export const presentUser = (u: User): UserDto => ({ id: u.id, email: u.email, name: u.name, units: u.units, isAdmin: u.isAdmin });
