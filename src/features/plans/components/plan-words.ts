// How the season plan is written for people: states, statuses, when work is planned, who did
// what and when, and the parts of an action by name.
import type { ActionStatus, PlanAction, PlanPerson, PlanState } from '../../../../shared/schemas/plans';

export const STATE_WORDS: Record<PlanState, { label: string; hint: string }> = {
  draft: { label: 'Being written', hint: 'The farmer and the advisor add and change work; the farmer sends it for review.' },
  submitted: { label: 'With the advisor', hint: 'Sent for review: it cannot be changed until the advisor returns or approves it.' },
  returned: { label: 'Sent back', hint: 'The advisor asked for changes; see their comments, change the plan and send it again.' },
  approved: { label: 'Approved', hint: 'Agreed with the advisor; the landowner reads this version. A change starts a new revision.' },
};

export const STATUS_WORDS: Record<ActionStatus, string> = { planned: 'To do', done: 'Done', checked: 'Done and checked' };

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', timeZone: 'UTC' });

/** "14 Sep 2027" from "2027-09-14". */
export const dayWords = (isoDay: string) => dateFormat.format(new Date(`${isoDay}T00:00:00Z`));

/** When the work is planned: a day, a window ("1 Sep – 30 Sep 2027"), from or by a day, or not set. */
export function whenWords(a: Pick<PlanAction, 'plannedOn' | 'plannedFrom' | 'plannedTo'>): string {
  if (a.plannedOn) return dayWords(a.plannedOn);
  if (a.plannedFrom && a.plannedTo) return `${dayFormat.format(new Date(`${a.plannedFrom}T00:00:00Z`))} – ${dayWords(a.plannedTo)}`;
  if (a.plannedFrom) return `from ${dayWords(a.plannedFrom)}`;
  if (a.plannedTo) return `by ${dayWords(a.plannedTo)}`;
  return 'no date yet';
}

const stampFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "Mara Ellis, 3 Dec 2026, 14:05". */
export function byWhen(person: PlanPerson, at: string | null): string {
  const who = person?.name ?? 'someone';
  return at ? `${who}, ${stampFormat.format(new Date(at))}` : who;
}

/** The parts of an action by the names the screen uses (for what changed). */
export const PART_WORDS: Partial<Record<keyof PlanAction, string>> = {
  fieldId: 'field',
  treatment: 'treatment',
  title: 'title',
  quantity: 'amount',
  unit: 'unit',
  cost: 'cost',
  plannedOn: 'day',
  plannedFrom: 'from',
  plannedTo: 'to',
  doneBy: 'who does it',
  status: 'status',
  notes: 'notes',
};

export const valueWords = (v: unknown): string => (v === null || v === undefined || v === '' ? 'nothing' : String(v));
