// The season before, beside this season's plan: what was planned against what was done (and
// checked), field by field, and each field's A across every season as a small chart.
import type { Units } from '../../../../shared/schemas/auth';
import { Notice } from '../../../components/ui/notice';
import { amountWords } from '../../../lib/amount-words';
import { useSeasonPlan } from '../api/get-season-plan';
import { useSoilLossHistory } from '../api/get-soil-loss-history';
import { dayWords, STATUS_WORDS } from './plan-words';
import { SoilLossChart } from './soil-loss-chart';

type Props = { farmId: number; previousSeason: string | null; units: Units };

export function LastSeason({ farmId, previousSeason, units }: Props) {
  const previous = useSeasonPlan(farmId, previousSeason);
  const history = useSoilLossHistory(farmId);
  const plan = previous.data;
  const done = plan?.actions.filter((a) => a.status !== 'planned').length ?? 0;
  return (
    <section aria-labelledby="last-season-heading" className="flex flex-col gap-3" data-testid="last-season">
      <h2 id="last-season-heading" className="text-xl font-semibold">
        {previousSeason ? `Season ${previousSeason}: planned against done` : 'Earlier seasons'}
      </h2>
      {!previousSeason ? null : previous.isPending ? (
        <p className="text-sm text-ink-soft">Reading season {previousSeason}…</p>
      ) : !plan ? (
        <p className="text-sm text-ink-soft">Season {previousSeason} had no plan.</p>
      ) : (
        <>
          <p className="text-sm" data-testid="last-season-summary">
            {done} of {plan.actions.length} planned piece{plan.actions.length === 1 ? '' : 's'} of work recorded done.
          </p>
          <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/50">
            <table className="w-full text-sm" data-testid="last-season-table">
              <thead className="border-b border-paper-edge text-left text-ink-soft">
                <tr>
                  <th scope="col" className="px-2 py-1 font-medium">Field</th>
                  <th scope="col" className="px-2 py-1 font-medium">Work</th>
                  <th scope="col" className="px-2 py-1 font-medium">Planned</th>
                  <th scope="col" className="px-2 py-1 font-medium">Done</th>
                  <th scope="col" className="px-2 py-1 font-medium">Status</th>
                </tr>
              </thead>
              <tbody>
                {plan.actions.map((a) => (
                  <tr key={a.id} className="border-b border-paper-edge align-top last:border-b-0" data-testid="last-season-row">
                    <td className="px-2 py-1">{a.fieldName}</td>
                    <td className="px-2 py-1 font-semibold">{a.title}</td>
                    <td className="num px-2 py-1">{a.quantity != null && a.unit ? amountWords(a.quantity, a.unit, units) : '—'}</td>
                    <td className="num px-2 py-1">
                      {a.status === 'planned' ? (
                        <span className="text-ink-soft">not recorded</span>
                      ) : (
                        <>
                          {a.appliedQuantity != null && a.unit ? amountWords(a.appliedQuantity, a.unit, units) : 'done'}
                          {a.doneOn ? `, ${dayWords(a.doneOn)}` : ''}
                        </>
                      )}
                    </td>
                    <td className="px-2 py-1">{STATUS_WORDS[a.status]}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
      {history.isError ? (
        <Notice tone="error">{history.error.message}</Notice>
      ) : history.data && history.data.seasons.length > 1 ? (
        <SoilLossChart history={history.data} units={units} />
      ) : history.data ? (
        <p className="text-sm text-ink-soft" data-testid="soil-loss-chart-waiting">Each field’s A across seasons is drawn here once the farm has a second season.</p>
      ) : null}
    </section>
  );
}
