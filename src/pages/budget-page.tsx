// Treatments and budget (/farms/:farmId/budget): the budget planner for a season beside the
// farm's price list. For farmers and advisors; a landowner is told it is not theirs to see.
import { Link, useParams } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { farmScreenWaiting } from '../components/cannot-open';
import { Notice } from '../components/ui/notice';
import { Loading } from '../components/ui/spinner';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { BudgetPlanner } from '../features/budget/components/budget-planner';
import { AddOptionButton } from '../features/plans/components/add-option-button';
import { PriceListPanel } from '../features/budget/components/price-list-form';
import { useFarm } from '../features/farms/api/get-farm';
import { RoleBadge } from '../features/farms/components/role-badge';
import { SeasonPicker } from '../features/seasons/components/season-picker';
import { useSeasonChoice } from '../features/seasons/components/use-season-choice';
import { paths } from '../lib/paths';

const SCREEN = 'Treatments and budget';
const INTRO =
  'Type what there is to spend this season and choose what matters most: one treatment is picked for each field the money reaches. Costs come from the farm’s price list on this screen; every field’s options and their figures are on its Risk tab.';

export function BudgetPage() {
  const farmId = Number(useParams().farmId);
  const farm = useFarm(farmId);
  const me = useMe();
  const { seasons, season, setSeason } = useSeasonChoice(farmId);
  const header = <AppHeader screen={SCREEN} farmName={farm.data?.name} role={farm.data?.role} menu={<UserMenu />} />;

  const waiting = farmScreenWaiting({ farmId, farm, meLoaded: !!me.data, header, title: 'This screen cannot be opened', loadingLabel: 'Opening the budget…' });
  if (waiting || !farm.data || !me.data) return waiting;

  const role = farm.data.role;
  if (role === 'landowner')
    return (
      <div className="flex min-h-full flex-col">
        {header}
        <main className="mx-auto w-full max-w-2xl p-6">
          <Notice testId="budget-not-for-landowner" title="Not part of the landowner view">
            Treatments, prices and budgets are worked out by the farmer and the advisor. You will see the plan once it is approved.
          </Notice>
          <Link to={paths.farmMap.getHref(farmId)} className="mt-4 inline-block font-semibold text-clay-dark underline">
            Back to the Farm map
          </Link>
        </main>
      </div>
    );

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
            <p className="text-sm text-ink-soft">{INTRO}</p>
          </div>
          <SeasonPicker farmId={farmId} seasons={seasons.data ?? []} season={season} onChange={setSeason} canAdd={role === 'farmer'} />
        </div>
        <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(340px,36%)]">
          <div className="min-w-0">
            {seasons.isPending ? (
              <Loading label="Loading the seasons…" />
            ) : season ? (
              <BudgetPlanner
                key={season}
                farmId={farmId}
                season={season}
                units={me.data.units}
                choiceExtra={({ season: s, fieldId, optionId }) => <AddOptionButton farmId={farmId} season={s} fieldId={fieldId} optionId={optionId} />}
              />
            ) : (
              <Notice tone="caution" testId="no-season">
                This farm has no season yet.{role === 'farmer' ? ' Add one to plan its treatments.' : ' The farmer adds seasons.'}
              </Notice>
            )}
          </div>
          <PriceListPanel farmId={farmId} />
        </div>
      </main>
    </div>
  );
}

export default BudgetPage;
