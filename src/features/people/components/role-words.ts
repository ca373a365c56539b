// Roles in Fieldshed's words, for the People screen.
import type { Role } from '../../../../shared/schemas/auth';

export const ROLE_CHOICES: { value: Role; label: string; hint: string }[] = [
  { value: 'advisor', label: 'Advisor', hint: 'Sees every field, works on assessments, reviews the season plan.' },
  { value: 'landowner', label: 'Landowner', hint: 'Reads the map and the approved plan for their own fields only.' },
  { value: 'farmer', label: 'Farmer', hint: 'Changes everything on the farm and invites people.' },
];

export const roleLabel = (role: Role) => ROLE_CHOICES.find((r) => r.value === role)?.label ?? role;
