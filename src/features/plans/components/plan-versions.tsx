// Every approved revision of the plan, oldest first, with who approved it and when and what
// changed from the one before; then the revision being worked on. Each opens to its work list.
import type { PlanVersion } from '../../../../shared/schemas/plans';
import { formatMoney } from '../../../lib/money';
import { usePlanVersions } from '../api/get-plan-versions';
import { PlanChangeList } from './change-list';
import { PlanStateBadge } from './plan-state-badge';
import { byWhen, whenWords } from './plan-words';

function VersionBody({ v }: { v: PlanVersion }) {
  return (
    <div className="flex flex-col gap-2 pt-2">
      {v.changes ? (
        <div>
          <p className="text-xs font-semibold uppercase tracking-wide text-ink-soft">What changed from revision {v.changes.fromRevision}</p>
          <PlanChangeList changes={v.changes} />
        </div>
      ) : null}
      <ul className="flex flex-col gap-0.5 text-sm">
        {v.plan.actions.map((a) => (
          <li key={a.id}>
            {a.fieldName}: <span className="font-semibold">{a.title}</span>, {whenWords(a)}
            {a.cost != null ? <span className="num">, {formatMoney(a.cost, a.currency)}</span> : null}
          </li>
        ))}
      </ul>
    </div>
  );
}

export function PlanVersions({ planId }: { planId: number }) {
  const versions = usePlanVersions(planId);
  if (versions.isPending) return <p className="text-sm text-ink-soft">Reading the versions…</p>;
  if (versions.isError) return <p className="text-sm text-alert">{versions.error.message}</p>;
  return (
    <ol className="flex flex-col gap-2" data-testid="plan-versions">
      {versions.data.map((v) => (
        <li key={v.revision} className="rounded-md border border-paper-edge bg-white/50 px-3 py-2" data-testid="plan-version">
          <details>
            <summary className="flex cursor-pointer flex-wrap items-center gap-2 text-sm">
              <span className="font-semibold">Revision {v.revision}</span>
              <PlanStateBadge state={v.state} />
              {v.approvedAt ? <span className="text-ink-soft">{byWhen(v.approvedBy, v.approvedAt)}</span> : null}
            </summary>
            <VersionBody v={v} />
          </details>
        </li>
      ))}
    </ol>
  );
}
