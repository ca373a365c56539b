// The caller's role on a farm, in words.
import type { Role } from '../../../../shared/schemas/auth';

export const ROLE_LABELS: Record<Role, string> = { farmer: 'Farmer', advisor: 'Advisor', landowner: 'Landowner' };

export function RoleBadge({ role }: { role: Role }) {
  return (
    <span
      data-testid="role-badge"
      className={`inline-block rounded-full border px-2 py-0.5 text-xs font-semibold ${
        role === 'farmer' ? 'border-clay-dark bg-clay-light text-clay-dark' : 'border-ink-faint bg-paper-deep text-ink-soft'
      }`}
    >
      {ROLE_LABELS[role] ?? role}
    </span>
  );
}
