// The Season plan screen: the work planned per field with its cost, timing, who does it and its
// status; totals and the predicted soil loss after the work; the review (send, send back,
// approve) and the conversation; every version with what changed; and the season before,
// planned against done, with each field's A across seasons.
import { useState } from 'react';
import type { Role, Units } from '../../../../shared/schemas/auth';
import type { PlanAction } from '../../../../shared/schemas/plans';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import { useAddPlanAction } from '../api/add-plan-action';
import { useAddPlanComment } from '../api/add-plan-comment';
import { useCheckAction } from '../api/check-action';
import { useCreatePlan } from '../api/create-plan';
import { useDeletePlanAction } from '../api/delete-plan-action';
import { usePlan } from '../api/get-plan';
import { useSeasonPlan } from '../api/get-season-plan';
import { useMarkActionDone } from '../api/mark-action-done';
import { useReviewPlan } from '../api/review-plan';
import { useUpdatePlanAction } from '../api/update-plan-action';
import { ActionForm, draftOf } from './action-form';
import type { ActionHandlers } from './action-item';
import { DoneForm } from './done-form';
import { FieldPlanCard } from './field-plan-card';
import { LastSeason } from './last-season';
import { CommentForm, CommentList } from './plan-comments';
import { PlanSummary } from './plan-summary';
import { PlanVersions } from './plan-versions';
import { ReviewBar } from './review-bar';

type Props = { farmId: number; role: Role; season: string; previousSeason: string | null; fields: { id: number; name: string }[]; units: Units };

function Sections({ planId, role, fields, units }: { planId: number; role: Role; fields: Props['fields']; units: Units }) {
  const plan = usePlan(planId);
  const add = useAddPlanAction(planId);
  const update = useUpdatePlanAction(planId);
  const remove = useDeletePlanAction(planId);
  const comment = useAddPlanComment(planId);
  const review = useReviewPlan(planId);
  const done = useMarkActionDone(planId);
  const check = useCheckAction(planId);
  const [adding, setAdding] = useState(false);
  const [doneFor, setDoneFor] = useState<PlanAction | null>(null);

  if (plan.isPending) return <Loading label="Opening the plan…" />;
  if (plan.isError) return <Notice tone="error" title="The plan could not be loaded">{plan.error.message}</Notice>;
  const p = plan.data;
  const writer = role === 'farmer' || role === 'advisor';
  const canChange = writer && p.state !== 'submitted';
  const handlers: ActionHandlers = {
    update: (a, version, payload) => update.mutateAsync({ actionId: a.id, patch: { version, ...payload } }),
    remove: (a) => remove.mutateAsync({ actionId: a.id, version: a.version }),
    comment: (a, body) => comment.mutateAsync({ body, actionId: a.id }),
    markDone: (a) => setDoneFor(a),
    check: (a) => check.mutateAsync({ actionId: a.id, version: a.version }),
  };

  return (
    // On a phone: the review first, then the work, the comments and the versions; on a wide
    // screen the work on the left and the rest beside it.
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(300px,34%)] lg:grid-rows-[auto_auto_auto_1fr]">
      <div className="min-w-0 lg:col-start-2 lg:row-start-1">
        <ReviewBar plan={p} role={role} onStep={(step) => review.mutateAsync(step)} />
      </div>
      <div className="flex min-w-0 flex-col gap-4 lg:col-start-1 lg:row-span-4 lg:row-start-1">
        <PlanSummary plan={p} units={units} />
        {p.actions.length === 0 ? (
          <Notice testId="plan-empty">
            No work in the plan yet. Add it here, or in one click from a field’s options on its Risk tab or from the budget on Treatments and budget.
          </Notice>
        ) : null}
        {p.totals.fields.map((t) => (
          <FieldPlanCard key={t.fieldId} plan={p} total={t} fields={fields} units={units} canChange={canChange} canFollowUp={writer} canCheck={role === 'advisor'} handlers={handlers} />
        ))}
        {canChange ? (
          adding ? (
            <div className="flex flex-col gap-2">
              {p.state === 'approved' ? (
                <Notice tone="caution">Adding work to the approved plan starts revision {p.revision + 1}, which needs approval again. The landowner keeps reading revision {p.revision} until then.</Notice>
              ) : null}
              <ActionForm
                fields={fields}
                initial={draftOf(null)}
                currency={p.currency}
                submitLabel="Add to the plan"
                onSubmit={(payload) => add.mutateAsync(payload).then(() => setAdding(false))}
                onCancel={() => setAdding(false)}
              />
            </div>
          ) : (
            <Button variant="secondary" className="self-start" onClick={() => setAdding(true)} data-testid="plan-add-work">
              Add work to the plan
            </Button>
          )
        ) : null}
        {p.state === 'submitted' && writer ? <p className="text-sm text-ink-soft">The work cannot be changed while the advisor reviews it; work done can still be recorded.</p> : null}
      </div>
      <aside className="flex min-w-0 flex-col gap-4 lg:col-start-2 lg:row-start-2">
        <section aria-labelledby="conversation-heading" className="flex flex-col gap-2" data-testid="plan-conversation">
          <h2 id="conversation-heading" className="text-lg font-semibold">
            Comments on the plan
          </h2>
          <CommentList comments={p.comments.filter((c) => c.actionId === null)} testId="plan-comments" />
          {p.comments.filter((c) => c.actionId === null).length === 0 ? <p className="text-sm text-ink-soft">None yet.</p> : null}
          {writer ? <CommentForm label="Add a comment" onSubmit={(body) => comment.mutateAsync({ body })} /> : null}
        </section>
        <section aria-labelledby="versions-heading" className="flex flex-col gap-2">
          <h2 id="versions-heading" className="text-lg font-semibold">
            Versions
          </h2>
          <PlanVersions planId={p.id} />
        </section>
      </aside>
      {doneFor ? (
        <DoneForm action={doneFor} onSave={(input) => done.mutateAsync({ actionId: doneFor.id, input })} onClose={() => setDoneFor(null)} />
      ) : null}
    </div>
  );
}

export function PlanScreen({ farmId, role, season, previousSeason, fields, units }: Props) {
  const seasonPlan = useSeasonPlan(farmId, season);
  const create = useCreatePlan(farmId);
  const writer = role === 'farmer' || role === 'advisor';
  let body;
  if (seasonPlan.isPending) body = <Loading label="Looking for the season’s plan…" />;
  else if (seasonPlan.isError) body = <Notice tone="error" title="The plan could not be loaded">{seasonPlan.error.message}</Notice>;
  else if (!seasonPlan.data)
    body = (
      <Notice testId="no-plan" title={`No plan for ${season} yet`}>
        <p>A plan lists the work for each field this season: what, how much, what it costs, when and who does it.</p>
        {writer ? (
          <Button className="mt-2" disabled={create.isPending} onClick={() => create.mutate(season)} data-testid="plan-start">
            Start the {season} plan
          </Button>
        ) : null}
        {create.isError ? <p className="mt-1 text-alert">{create.error.message}</p> : null}
      </Notice>
    );
  else body = <Sections planId={seasonPlan.data.id} role={role} fields={fields} units={units} />;
  return (
    <div className="flex flex-col gap-6">
      {body}
      <LastSeason farmId={farmId} previousSeason={previousSeason} units={units} />
    </div>
  );
}
