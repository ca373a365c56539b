// One person on the farm: name, address, role and (for a landowner) their fields; the farmer may
// change the role or remove them.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import type { Role } from '../../../../shared/schemas/auth';
import type { Person } from '../../../../shared/schemas/people';
import { useChangeRole } from '../api/change-role';
import { useRemovePerson } from '../api/remove-person';
import { FieldChecklist, type FieldChoice } from './field-checklist';
import { ROLE_CHOICES, roleLabel } from './role-words';

export function PersonRow({ farmId, person, fields, canManage }: { farmId: number; person: Person; fields: FieldChoice[]; canManage: boolean }) {
  const [editing, setEditing] = useState(false);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const [role, setRole] = useState<Role>(person.role);
  const [fieldIds, setFieldIds] = useState<number[]>(person.fieldIds);
  const change = useChangeRole(farmId);
  const remove = useRemovePerson(farmId);
  const names = person.fieldIds.map((id) => fields.find((f) => f.id === id)?.name).filter(Boolean);
  const error = change.error ?? remove.error;

  return (
    <li className="flex flex-col gap-2 border-b border-paper-edge py-3 last:border-b-0" data-testid="person-row">
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <span className="font-semibold">
          {person.name}
          {person.isYou ? <span className="font-normal text-ink-soft"> (you)</span> : null}
        </span>
        <span className="break-all text-sm text-ink-soft">{person.email}</span>
        <span className="rounded-full border border-ink-faint bg-paper-deep px-2 py-0.5 text-xs font-semibold text-ink-soft" data-testid="person-role">
          {roleLabel(person.role)}
        </span>
      </div>
      {person.role === 'landowner' ? <p className="text-sm text-ink-soft">Owns: {names.length ? names.join(', ') : 'no field at the moment'}</p> : null}
      {canManage && !editing && !confirmRemove ? (
        <div className="flex flex-wrap gap-2">
          <Button size="sm" variant="secondary" onClick={() => setEditing(true)} data-testid="person-change-role">
            Change role
          </Button>
          {!person.isYou ? (
            <Button size="sm" variant="danger" onClick={() => setConfirmRemove(true)} data-testid="person-remove">
              Remove from the farm
            </Button>
          ) : null}
        </div>
      ) : null}
      {editing ? (
        <div className="flex flex-col gap-2 rounded-md border border-paper-edge bg-white/50 p-3">
          <label className="flex flex-col gap-1 text-sm font-medium">
            New role
            <select className="rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base" value={role} onChange={(e) => setRole(e.target.value as Role)} data-testid="person-role-select">
              {ROLE_CHOICES.map((r) => (
                <option key={r.value} value={r.value}>
                  {r.label}
                </option>
              ))}
            </select>
          </label>
          {role === 'landowner' ? <FieldChecklist fields={fields} value={fieldIds} onChange={setFieldIds} /> : null}
          <div className="flex flex-wrap gap-2">
            <Button
              size="sm"
              disabled={change.isPending || (role === 'landowner' && fieldIds.length === 0)}
              onClick={() => change.mutate({ membershipId: person.membershipId, input: { role, fieldIds: role === 'landowner' ? fieldIds : undefined } }, { onSuccess: () => setEditing(false) })}
            >
              Save the role
            </Button>
            <Button size="sm" variant="quiet" onClick={() => setEditing(false)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
      {confirmRemove ? (
        <Notice tone="caution" title={`Remove ${person.name} from the farm?`}>
          <p>They lose access at once. Their fields stay on the farm without an owner.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button size="sm" variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(person.membershipId)} data-testid="person-remove-confirm">
              Remove
            </Button>
            <Button size="sm" variant="quiet" onClick={() => setConfirmRemove(false)}>
              Keep them
            </Button>
          </div>
        </Notice>
      ) : null}
      {error ? <Notice tone="error">{error.message}</Notice> : null}
    </li>
  );
}
