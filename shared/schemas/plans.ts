// Season plans: payloads (client forms and the server's validate()) and the API's answers.
// Money is in the plan's currency; dates are calendar dates written YYYY-MM-DD.
import { z } from 'zod';
import { TREATMENT_KEYS, type TreatmentKey } from '../erosion/treatments/types';
import { longText, plainText } from './plain-text';
import { SeasonLabel } from './season';

export const PLAN_STATES = ['draft', 'submitted', 'returned', 'approved'] as const;
export type PlanState = (typeof PLAN_STATES)[number];
export const ACTION_STATUSES = ['planned', 'done', 'checked'] as const;
export type ActionStatus = (typeof ACTION_STATUSES)[number];

/** A treatment the engine knows, or 'other' for work typed by hand (it then needs a title). */
export const ACTION_TREATMENTS = [...TREATMENT_KEYS, 'other'] as const;
export type ActionTreatment = TreatmentKey | 'other';

const date = (f: string) => z.iso.date({ error: `${f} must be a date written YYYY-MM-DD` });
const amount = (f: string, max: number) =>
  z
    .number({ error: `${f} must be a number` })
    .refine(Number.isFinite, `${f} must be a finite number`)
    .pipe(z.number().min(0, `${f} must be at least 0`).max(max, `${f} must be at most ${max}`));
/** Text that may run over several lines (notes, comments), trimmed. */
const status = z.enum(ACTION_STATUSES, { error: "status must be 'planned', 'done' or 'checked'" });
const version = z.number({ error: 'version must be the version you read' }).int('version must be a whole number').positive('version must be at least 1');

const actionFields = {
  fieldId: z.number({ error: 'fieldId must be a field id' }).int('fieldId must be a whole number').positive('fieldId must be a field id'),
  treatment: z.enum(ACTION_TREATMENTS, { error: `treatment must be one of ${ACTION_TREATMENTS.join(', ')}` }),
  title: plainText('title', 120).nullable().optional(),
  quantity: amount('quantity', 1_000_000).nullable().optional(),
  unit: plainText('unit', 20).nullable().optional(),
  cost: amount('cost', 10_000_000).nullable().optional(),
  /** A planned day, or a window (plannedFrom … plannedTo); not both. */
  plannedOn: date('plannedOn').nullable().optional(),
  plannedFrom: date('plannedFrom').nullable().optional(),
  plannedTo: date('plannedTo').nullable().optional(),
  /** Who does the work (a person or a contractor, as text). */
  doneBy: plainText('doneBy', 120).nullable().optional(),
  status: status.default('planned'),
  notes: longText('notes', 2000).nullable().optional(),
};

type ActionLike = { treatment: string; title?: string | null; quantity?: number | null; unit?: string | null; plannedOn?: string | null; plannedFrom?: string | null; plannedTo?: string | null };

/** The checks across fields of an action, as [path, message] or null. */
export function actionProblem(a: ActionLike): [string, string] | null {
  if (a.treatment === 'other' && !a.title) return ['title', "title is required when treatment is 'other'"];
  if (a.quantity != null && !a.unit) return ['unit', 'unit is required with a quantity (for example t, ha or m)'];
  if (a.plannedOn && (a.plannedFrom || a.plannedTo)) return ['plannedOn', 'give either plannedOn or a window (plannedFrom and plannedTo), not both'];
  if (a.plannedFrom && a.plannedTo && a.plannedFrom > a.plannedTo) return ['plannedTo', 'plannedTo must not be before plannedFrom'];
  return null;
}

/** POST /api/plans/:planId/actions */
export const PlanActionCreate = z.object(actionFields).superRefine((a, ctx) => {
  const p = actionProblem(a);
  if (p) ctx.addIssue({ code: 'custom', path: [p[0]], message: p[1] });
});
export type PlanActionCreate = z.input<typeof PlanActionCreate>;

/** PATCH /api/plan-actions/:actionId: the version read and the parts that change. */
export const PlanActionUpdate = z.object({ version, ...z.object(actionFields).partial().shape, status: status.optional() });
export type PlanActionUpdate = z.input<typeof PlanActionUpdate>;

/** DELETE /api/plan-actions/:actionId (version in the body or as ?version=). */
export const PlanActionDelete = z.object({ version: z.coerce.number({ error: 'version must be the version you read' }).pipe(version) });

/** A number sent as JSON or as multipart text; '' and absent mean none. */
const formAmount = (f: string, max: number) =>
  z.preprocess((v) => (v === '' || v === undefined || v === null ? undefined : typeof v === 'string' ? Number(v) : v), amount(f, max).optional());

/**
 * POST /api/plan-actions/:actionId/done (JSON, or multipart with a photo as the part "file"):
 * the day the work was done and the amount actually applied. A follow-up record: it changes
 * neither the plan's version nor its revision.
 */
export const PlanActionDone = z.object({
  version: z.coerce.number({ error: 'version must be the version you read' }).pipe(version),
  doneOn: date('doneOn'),
  appliedQuantity: formAmount('appliedQuantity', 1_000_000),
  note: z.preprocess((v) => (v === '' ? undefined : v), longText('note', 2000).optional()),
});
export type PlanActionDone = z.input<typeof PlanActionDone>;
/** POST /api/plan-actions/:actionId/check (advisor): the work done was seen and is right. */
export const PlanActionCheck = z.object({ version });
/** POST /api/plans/:planId/actions/from-option: a field's treatment option, one action per treatment. */
export const PlanFromOption = z.object({
  fieldId: actionFields.fieldId,
  optionId: z.string({ error: 'optionId must be the id of one of the field’s treatment options' }).trim().min(1, 'optionId must not be empty').max(200, 'optionId is too long'),
});

/** POST /api/farms/:farmId/plans */
export const PlanCreate = z.object({ season: SeasonLabel });
/** POST /api/plans/:planId/submit */
export const PlanSubmit = z.object({ version });
/** POST /api/plans/:planId/return: the advisor says what to change. */
export const PlanReturn = z.object({ version, comment: longText('comment', 4000) });
/** POST /api/plans/:planId/approve */
export const PlanApprove = z.object({ version, comment: longText('comment', 4000).nullable().optional() });
/** POST /api/plans/:planId/comments: on the plan, or on one of its actions. */
export const PlanCommentCreate = z.object({ body: longText('body', 4000), actionId: z.number().int().positive('actionId must be an action id').nullable().optional() });

// ------------------------------------------------------------------ answers

export type PlanPerson = { id: number; name: string } | null;

export type PlanAction = {
  id: number;
  planId: number;
  fieldId: number;
  fieldName: string;
  treatment: ActionTreatment;
  title: string;
  quantity: number | null;
  unit: string | null;
  cost: number | null;
  currency: string;
  plannedOn: string | null;
  plannedFrom: string | null;
  plannedTo: string | null;
  doneBy: string | null;
  status: ActionStatus;
  notes: string | null;
  version: number;
  createdBy: PlanPerson;
  updatedBy: PlanPerson;
  updatedAt: string;
  /** Follow-up (not a change of the plan): the day done, the amount actually applied (in unit), a note, who recorded it and when. */
  doneOn: string | null;
  appliedQuantity: number | null;
  doneNote: string | null;
  doneRecordedBy: PlanPerson;
  doneRecordedAt: string | null;
  /** The advisor who checked the work, and when. */
  checkedBy: PlanPerson;
  checkedAt: string | null;
  /** A photo of the work: GET /api/plan-actions/:id/photo (and /photo/thumbnail). */
  hasPhoto: boolean;
};

/** An action's follow-up before any is recorded (and in revisions frozen before follow-up existed). */
export const NO_FOLLOW_UP = { doneOn: null, appliedQuantity: null, doneNote: null, doneRecordedBy: null, doneRecordedAt: null, checkedBy: null, checkedAt: null, hasPhoto: false } as const;

export type PlanComment = {
  id: number;
  /** The action it is about; null for the whole plan (or an action since removed). */
  actionId: number | null;
  revision: number;
  kind: 'comment' | 'return' | 'approval';
  author: PlanPerson;
  body: string;
  createdAt: string;
};

export type PlanFieldTotal = { fieldId: number; fieldName: string; actions: number; cost: number };

/** Soil loss of a field: A in t/ha/yr, A/T, and tonnes a year over the field. */
export type SoilLossFigures = { soilLossTPerHaYr: number; aOverT: number; tonnesPerYr: number };

/** A field's soil loss now and after the treatments its actions plan (typed work is not modelled). */
export type PlanFieldPrediction = { fieldId: number; fieldName: string; treatments: TreatmentKey[] } & (
  | {
      ok: true;
      current: SoilLossFigures;
      planned: SoilLossFigures;
      tonnesSavedPerYr: number;
      reachesT: boolean;
      /** What the treatments do that A does not show (a waterway against gullies, a strip trapping sediment …). */
      effects: string[];
    }
  | { ok: false; reason: string }
);

/** What the plan's treatments would do, field by field, from the season's assessments. */
export type PlanPrediction = { fields: PlanFieldPrediction[]; tonnesSavedPerYr: number };

export type Plan = {
  id: number;
  farmId: number;
  season: string;
  state: PlanState;
  /** Send it back with submit, return and approve; a stale one gets 409. */
  version: number;
  /** The revision shown: 1 for the first, one more each time an approved plan is changed. */
  revision: number;
  /** The newest approved revision (what a landowner reads), or null. */
  approvedRevision: number | null;
  /** True for an approved revision as it was frozen (the landowner's view, or a version opened). */
  frozen: boolean;
  currency: string;
  createdBy: PlanPerson;
  submittedBy: PlanPerson;
  submittedAt: string | null;
  returnedBy: PlanPerson;
  returnedAt: string | null;
  approvedBy: PlanPerson;
  approvedAt: string | null;
  actions: PlanAction[];
  totals: { cost: number; fields: PlanFieldTotal[] };
  /** Predicted A and A/T per field after its planned treatments, and the tonnes a year the farm saves. */
  prediction: PlanPrediction;
  /** The review conversation; empty for a landowner. */
  comments: PlanComment[];
};

/** One field of an action that changed between two versions. */
export type ActionFieldChange = { key: keyof PlanAction; from: unknown; to: unknown };
export type PlanChanges = {
  fromRevision: number;
  added: PlanAction[];
  removed: PlanAction[];
  changed: { actionId: number; title: string; fieldName: string; fields: ActionFieldChange[] }[];
};

/** GET /api/plans/:planId/versions: every approved revision, oldest first, then the one being worked on. */
export type PlanVersion = {
  revision: number;
  /** approved for a frozen revision; the working state for the newest unapproved one. */
  state: PlanState;
  approvedBy: PlanPerson;
  approvedAt: string | null;
  plan: Plan;
  /** What changed from the version before (null for the first). */
  changes: PlanChanges | null;
};
