// What changed between two versions of a plan: the list a reviewer reads, and what the client
// shows after a 409. Hand-made actions; no published source applies (bookkeeping, not science).
import { describe, expect, it } from 'vitest';
import { actionChanges, planChanges } from '../../../shared/plan-changes';
import { NO_FOLLOW_UP, type PlanAction } from '../../../shared/schemas/plans';

const action = (id: number, over: Partial<PlanAction> = {}): PlanAction => ({
  id,
  planId: 1,
  fieldId: 10,
  fieldName: 'Long Slope',
  treatment: 'no-till',
  title: 'No-till',
  quantity: 18.9,
  unit: 'ha',
  cost: 850,
  currency: 'USD',
  plannedOn: null,
  plannedFrom: '2027-04-20',
  plannedTo: '2027-05-10',
  doneBy: 'Mara',
  status: 'planned',
  notes: null,
  version: 1,
  createdBy: { id: 1, name: 'Mara' },
  updatedBy: { id: 1, name: 'Mara' },
  updatedAt: '2027-01-01T00:00:00.000Z',
  ...NO_FOLLOW_UP,
  ...over,
});

describe('what changed between two versions of a plan', () => {
  it('lists added, removed and changed actions with each changed part', () => {
    const before = { revision: 1, actions: [action(1), action(2, { treatment: 'cover-crop', title: 'Cover crop' })] };
    const after = { actions: [action(1, { cost: 900, status: 'done', version: 2, updatedBy: { id: 2, name: 'Teo' } }), action(3, { fieldId: 11, fieldName: 'Swale Field' })] };
    const c = planChanges(before, after);
    expect(c.fromRevision).toBe(1);
    expect(c.added.map((a) => a.id)).toEqual([3]);
    expect(c.removed.map((a) => a.id)).toEqual([2]);
    expect(c.changed).toEqual([
      {
        actionId: 1,
        title: 'No-till',
        fieldName: 'Long Slope',
        fields: [
          { key: 'cost', from: 850, to: 900 },
          { key: 'status', from: 'planned', to: 'done' },
        ],
      },
    ]);
  });

  it('ignores the version, the editor and the time, which change with every save', () => {
    expect(actionChanges(action(1), action(1, { version: 5, updatedBy: null, updatedAt: '2028-01-01T00:00:00.000Z' }))).toEqual([]);
    expect(planChanges({ revision: 2, actions: [action(1)] }, { actions: [action(1, { version: 2 })] })).toEqual({ fromRevision: 2, added: [], removed: [], changed: [] });
  });
});
