// Landowner view (/farms/:farmId/approved-plan?season=): the approved plan for the fields the
// landowner owns; where a landowner lands on the farm. Farmers and advisors open it too, to see
// what the landowners read. Loaded lazily (the maps are large).
import { useParams } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { useSeasonPlan } from '../features/plans/api/get-season-plan';
import { PlanReportButton } from '../features/reports/components/plan-report-button';
import { farmScreenWaiting } from '../components/cannot-open';
import { Loading } from '../components/ui/spinner';
import { Notice } from '../components/ui/notice';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { useBasemap } from '../features/config/use-basemap';
import { useFarm } from '../features/farms/api/get-farm';
import { useFields } from '../features/fields/api/get-fields';
import { LandownerPlan } from '../features/plans/components/landowner-plan';
import { SeasonPicker } from '../features/seasons/components/season-picker';
import { useSeasonChoice } from '../features/seasons/components/use-season-choice';

const SCREEN = 'Landowner view';

export function LandownerPlanPage() {
  const farmId = Number(useParams().farmId);
  const farm = useFarm(farmId);
  const me = useMe();
  const { basemap } = useBasemap();
  const fields = useFields(farmId);
  const { seasons, season, setSeason } = useSeasonChoice(farmId);
  // The season's plan on paper, once there is one (for a landowner: an approved one).
  const plan = useSeasonPlan(farmId, season);
  const header = <AppHeader screen={SCREEN} farmName={farm.data?.name} role={farm.data?.role} menu={<UserMenu />} />;

  const waiting = farmScreenWaiting({ farmId, farm, meLoaded: !!me.data, header, title: 'This plan cannot be opened', loadingLabel: 'Opening the approved plan…' });
  if (waiting || !farm.data || !me.data) return waiting;
  const landowner = farm.data.role === 'landowner';

  return (
    <div className="flex min-h-full flex-col">
      {header}
      <main className="mx-auto flex w-full max-w-6xl flex-col gap-4 p-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div className="flex max-w-3xl flex-col gap-1">
            <h1 className="text-2xl font-semibold">{landowner ? 'The approved plan for your fields' : 'What the landowners read'}</h1>
            <p className="text-sm text-ink-soft">
              {landowner
                ? `The work agreed between the farmer and the advisor on the land you own at ${farm.data.name}, and what it should do for the topsoil. Read only.`
                : 'Each landowner reads the newest approved revision of the plan, cut to the fields they own. You see every field here.'}
            </p>
          </div>
          <div className="flex flex-wrap items-end gap-3">
            {plan.data ? <PlanReportButton planId={plan.data.id} season={plan.data.season} /> : null}
            <SeasonPicker farmId={farmId} seasons={seasons.data ?? []} season={season} onChange={setSeason} canAdd={false} />
          </div>
        </div>
        {seasons.isPending || fields.isPending ? (
          <Loading label="Loading…" />
        ) : !season ? (
          <Notice testId="no-season">There is no season on this farm yet.</Notice>
        ) : (
          <LandownerPlan
            key={season}
            farmId={farmId}
            season={season}
            fields={fields.data?.features ?? []}
            units={me.data.units}
            tileUrl={basemap?.url ?? null}
            tileAttribution={basemap?.attribution ?? null}
          />
        )}
      </main>
    </div>
  );
}

export default LandownerPlanPage;
