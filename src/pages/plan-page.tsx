// Season plan (/farms/:farmId/plan?season=): the farm's plan for a season, for the farmer and the
// advisor. A landowner is sent to the approved plan of their fields. Loaded lazily.
import { Navigate, useParams } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { useSeasonPlan } from '../features/plans/api/get-season-plan';
import { PlanReportButton } from '../features/reports/components/plan-report-button';
import { farmScreenWaiting } from '../components/cannot-open';
import { Loading } from '../components/ui/spinner';
import { Notice } from '../components/ui/notice';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { useFarm } from '../features/farms/api/get-farm';
import { RoleBadge } from '../features/farms/components/role-badge';
import { useFields } from '../features/fields/api/get-fields';
import { PlanScreen } from '../features/plans/components/plan-screen';
import { SeasonPicker } from '../features/seasons/components/season-picker';
import { useSeasonChoice } from '../features/seasons/components/use-season-choice';
import { paths } from '../lib/paths';

const SCREEN = 'Season plan';

export function PlanPage() {
  const farmId = Number(useParams().farmId);
  const farm = useFarm(farmId);
  const me = useMe();
  const fields = useFields(farmId);
  const { seasons, season, setSeason } = useSeasonChoice(farmId);
  // The season's plan on paper, once there is one (for a landowner: an approved one).
  const plan = useSeasonPlan(farmId, season);
  const header = <AppHeader screen={SCREEN} farmName={farm.data?.name} role={farm.data?.role} menu={<UserMenu />} />;

  const waiting = farmScreenWaiting({ farmId, farm, meLoaded: !!me.data, header, title: 'This plan cannot be opened', loadingLabel: 'Opening the plan…' });
  if (waiting || !farm.data || !me.data) return waiting;
  const role = farm.data.role;
  if (role === 'landowner') return <Navigate to={paths.landownerPlan.getHref(farmId, season)} replace />;
  const list = seasons.data ?? [];
  const at = list.findIndex((s) => s.label === season);
  const previousSeason = at >= 0 ? (list[at + 1]?.label ?? null) : null;
  const fieldChoices = (fields.data?.features ?? []).map((f) => ({ id: f.id, name: f.properties.name })).sort((a, b) => a.name.localeCompare(b.name));

  return (
    <div className="flex min-h-full flex-col">
      {header}
      <main className="flex w-full flex-col gap-4 p-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div className="flex max-w-3xl flex-col gap-1">
            <div className="flex flex-wrap items-center gap-2">
              <h1 className="text-2xl font-semibold">{SCREEN}</h1>
              <RoleBadge role={role} />
            </div>
            <p className="text-sm text-ink-soft">
              The work agreed for each field this season, what it costs and what it should save. The farmer sends it to the advisor, who sends it back with comments or approves it; the landowner then reads it for their fields.
            </p>
          </div>
          <div className="flex flex-wrap items-end gap-3">
            {plan.data ? <PlanReportButton planId={plan.data.id} season={plan.data.season} /> : null}
            <SeasonPicker farmId={farmId} seasons={list} season={season} onChange={setSeason} canAdd={role === 'farmer'} />
          </div>
        </div>
        {seasons.isPending ? (
          <Loading label="Loading the seasons…" />
        ) : !season ? (
          <Notice tone="caution" testId="no-season">
            This farm has no season yet.{role === 'farmer' ? ' Add one to plan its work.' : ' The farmer adds seasons.'}
          </Notice>
        ) : (
          <PlanScreen key={season} farmId={farmId} role={role} season={season} previousSeason={previousSeason} fields={fieldChoices} units={me.data.units} />
        )}
      </main>
    </div>
  );
}

export default PlanPage;
