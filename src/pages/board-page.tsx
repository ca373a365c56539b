// Priority board: a farm's fields ranked by A/T for a season (BoardPage, /farms/:farmId/board),
// and an advisor's board across every client farm (ClientBoardPage, /board). Loaded lazily.
import { useMemo } from 'react';
import { useQueries } from '@tanstack/react-query';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { Notice } from '../components/ui/notice';
import { farmScreenWaiting } from '../components/cannot-open';
import { Loading } from '../components/ui/spinner';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { useBoard } from '../features/board/api/get-board';
import { useClientBoard } from '../features/board/api/get-client-board';
import { BoardWorkspace } from '../features/board/components/board-workspace';
import { useBasemap } from '../features/config/use-basemap';
import { useFarm } from '../features/farms/api/get-farm';
import { useFarms } from '../features/farms/api/get-farms';
import { RoleBadge } from '../features/farms/components/role-badge';
import { getFieldsQueryOptions, useFields } from '../features/fields/api/get-fields';
import { getSeasonsQueryOptions } from '../features/seasons/api/get-seasons';
import { ClimatePanel } from '../features/seasons/components/climate-panel';
import { SeasonPicker } from '../features/seasons/components/season-picker';
import { useSeasonChoice } from '../features/seasons/components/use-season-choice';
import { useSeasonPlan } from '../features/plans/api/get-season-plan';
import { PlanReportButton } from '../features/reports/components/plan-report-button';
import { paths } from '../lib/paths';

const INTRO =
  'Fields ranked by A/T, the estimated yearly soil loss against what the soil can stand, then by the tonnes lost a year. Fields still missing an input come last.';

export function BoardPage() {
  const farmId = Number(useParams().farmId);
  const farm = useFarm(farmId);
  const me = useMe();
  const { basemap } = useBasemap();
  const { seasons, season, setSeason } = useSeasonChoice(farmId);
  const board = useBoard(farmId, season);
  const fields = useFields(farmId);
  // The season's plan, where there is one (for a landowner: an approved one), for its report.
  const plan = useSeasonPlan(farmId, season);
  const header = <AppHeader screen="Priority board" farmName={farm.data?.name} role={farm.data?.role} menu={<UserMenu />} />;

  const waiting = farmScreenWaiting({ farmId, farm, meLoaded: !!me.data, header, title: 'This board cannot be opened', loadingLabel: 'Opening the board…' });
  if (waiting || !farm.data || !me.data) return waiting;

  const role = farm.data.role;
  const units = me.data.units;

  return (
    <div className="flex min-h-full flex-col">
      {header}
      <main className="flex w-full flex-col gap-4 p-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div className="flex max-w-3xl flex-col gap-1">
            <div className="flex flex-wrap items-center gap-2">
              <h1 className="text-2xl font-semibold">Priority board</h1>
              <RoleBadge role={role} />
            </div>
            <p className="text-sm text-ink-soft">{INTRO}</p>
          </div>
          <div className="flex flex-wrap items-end gap-3">
            {plan.data ? <PlanReportButton planId={plan.data.id} season={plan.data.season} /> : null}
            <SeasonPicker farmId={farmId} seasons={seasons.data ?? []} season={season} onChange={setSeason} canAdd={role === 'farmer'} />
          </div>
        </div>
        {role === 'landowner' ? (
          <Notice testId="landowner-banner" title="Landowner view">
            Only the fields you own on {farm.data.name} are shown. Everything here is read only.
          </Notice>
        ) : null}
        <div className="max-w-xl">
          <ClimatePanel farmId={farmId} canEdit={role === 'farmer' || role === 'advisor'} units={units} />
        </div>
        {seasons.isPending ? (
          <Loading label="Loading the seasons…" />
        ) : !season ? (
          <Notice tone="caution" testId="no-season">
            This farm has no season yet.{role === 'farmer' ? ' Add one to record cropping and rank the fields.' : ' The farmer adds seasons.'}
          </Notice>
        ) : board.isPending ? (
          <Loading label="Ranking the fields…" />
        ) : board.isError ? (
          <Notice tone="error" title="The board could not be loaded">
            {board.error.message}
          </Notice>
        ) : board.data.rows.length === 0 ? (
          <Notice testId="board-empty">No fields to rank{role === 'landowner' ? ' that are yours' : ''} yet.</Notice>
        ) : (
          <BoardWorkspace
            rows={board.data.rows}
            fields={fields.data?.features ?? []}
            units={units}
            season={season}
            tileUrl={basemap?.url ?? null}
            tileAttribution={basemap?.attribution ?? null}
            treatmentsFarmId={role === 'landowner' ? undefined : farmId}
            fileStem={farm.data.name}
          />
        )}
      </main>
    </div>
  );
}

export function ClientBoardPage() {
  const me = useMe();
  const { basemap } = useBasemap();
  const farms = useFarms();
  const [params, setParams] = useSearchParams();
  const season = params.get('season');
  const board = useClientBoard(season);
  const clientFarms = useMemo(() => (farms.data ?? []).filter((f) => f.role === 'advisor'), [farms.data]);
  const seasonLists = useQueries({ queries: clientFarms.map((f) => getSeasonsQueryOptions(f.id)) });
  const labels = [...new Set(seasonLists.flatMap((q) => q.data?.map((s) => s.label) ?? []))].sort().reverse();
  const farmIds = [...new Set((board.data?.rows ?? []).map((r) => r.farmId))];
  const fieldLists = useQueries({ queries: farmIds.map((id) => getFieldsQueryOptions(id)) });
  const fields = fieldLists.flatMap((q) => q.data?.features ?? []);
  const header = <AppHeader screen="Priority board: all my client farms" menu={<UserMenu />} />;

  const setSeason = (label: string) =>
    setParams(
      (p) => {
        const q = new URLSearchParams(p);
        if (label) q.set('season', label);
        else q.delete('season');
        return q;
      },
      { replace: true },
    );

  return (
    <div className="flex min-h-full flex-col">
      {header}
      <main className="flex w-full flex-col gap-4 p-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div className="flex max-w-3xl flex-col gap-1">
            <h1 className="text-2xl font-semibold">All my client farms</h1>
            <p className="text-sm text-ink-soft">
              {INTRO} Every farm you advise is ranked together
              {clientFarms.length ? (
                <>
                  {': '}
                  {clientFarms.map((f, i) => (
                    <span key={f.id}>
                      {i > 0 ? ', ' : ''}
                      <Link to={paths.board.getHref(f.id)} className="font-semibold text-clay-dark underline underline-offset-2">
                        {f.name}
                      </Link>
                    </span>
                  ))}
                </>
              ) : null}
              .
            </p>
          </div>
          <label className="flex flex-col gap-1 text-sm font-medium" data-testid="season-picker">
            Season
            <select
              className="num rounded-md border border-ink-faint bg-white/70 px-3 py-1.5 text-base"
              value={season ?? ''}
              onChange={(e) => setSeason(e.target.value)}
              data-testid="season-select"
            >
              <option value="">Each farm's newest</option>
              {labels.map((l) => (
                <option key={l} value={l}>
                  {l}
                </option>
              ))}
            </select>
          </label>
        </div>
        {!me.data || farms.isPending || board.isPending ? (
          <Loading label="Ranking the fields of your client farms…" />
        ) : board.isError ? (
          <Notice tone="error" title="The board could not be loaded">
            {board.error.message}
          </Notice>
        ) : clientFarms.length === 0 ? (
          <Notice testId="board-empty">You do not advise any farm yet. A farmer can invite you to theirs as advisor.</Notice>
        ) : board.data.rows.length === 0 ? (
          <Notice testId="board-empty">No field of your client farms has a season{season ? ` labelled ${season}` : ''} yet.</Notice>
        ) : (
          <>
            <p className="text-sm text-ink-soft">
              Season shown: <span className="num font-semibold">{board.data.season}</span>
            </p>
            <BoardWorkspace
              rows={board.data.rows}
              fields={fields}
              units={me.data.units}
              season={season}
              showFarm
              fileStem="client farms"
              tileUrl={basemap?.url ?? null}
              tileAttribution={basemap?.attribution ?? null}
            />
          </>
        )}
      </main>
    </div>
  );
}

export default BoardPage;
