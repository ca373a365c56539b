// The plan report's words: when work is planned, its months in order, and the plan's state.
import { describe, expect, it } from 'vitest';
import { actionWhen } from '../../../shared/exports/action-words';
import { byMonth, dateWords, stateWords } from '../../../server/services/reports/report-words';
import type { Plan, PlanAction } from '../../../shared/schemas/plans';

const action = (over: Partial<PlanAction>): PlanAction =>
  ({ id: 1, title: 'Cover crop', plannedOn: null, plannedFrom: null, plannedTo: null, ...over }) as PlanAction;

describe('when work is planned', () => {
  it('writes a day, a window, an open end or no date', () => {
    expect(actionWhen(action({ plannedOn: '2027-08-25' }))).toBe('2027-08-25');
    expect(actionWhen(action({ plannedFrom: '2027-04-20', plannedTo: '2027-05-10' }))).toBe('2027-04-20 to 2027-05-10');
    expect(actionWhen(action({ plannedFrom: '2027-04-20' }))).toBe('from 2027-04-20');
    expect(actionWhen(action({}))).toBe('no date set');
  });

  it('groups work by the month it starts in, months in order, undated work last', () => {
    const groups = byMonth([
      action({ id: 1, plannedOn: '2027-09-02' }),
      action({ id: 2 }),
      action({ id: 3, plannedFrom: '2027-04-20', plannedTo: '2027-05-10' }),
      action({ id: 4, plannedOn: '2027-09-01' }),
    ]);
    expect(groups.map((g) => [g.month, g.actions.map((a) => a.id)])).toEqual([
      ['April 2027', [3]],
      ['September 2027', [4, 1]],
      ['No date set yet', [2]],
    ]);
  });
});

describe("the plan's state", () => {
  it('names who approved it and when', () => {
    const plan = { state: 'approved', revision: 2, approvedBy: { id: 1, name: 'Teo Lindqvist' }, approvedAt: '2027-03-12T15:00:00.000Z' } as Plan;
    expect(stateWords(plan)).toBe('Approved by Teo Lindqvist on 12 March 2027 (revision 2).');
    expect(dateWords('2027-03-12')).toBe('12 March 2027');
  });

  it('says plainly when it is not approved yet', () => {
    expect(stateWords({ state: 'draft', approvedRevision: null } as Plan)).toBe('Draft: not submitted or approved yet.');
    expect(stateWords({ state: 'submitted', submittedBy: { id: 1, name: 'Mara' }, submittedAt: '2027-02-01T00:00:00Z' } as Plan)).toMatch(/^Submitted by Mara on 1 February 2027 .*not approved yet\.$/);
  });
});
