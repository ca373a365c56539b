// Quick estimate: a soil-loss and runoff estimate from typed values, without a field.
import { AppHeader } from '../components/app-header';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { EstimateWorkspace } from '../features/estimate/components/estimate-workspace';

export function EstimatePage() {
  const me = useMe();
  return (
    <div className="flex min-h-full flex-col">
      <AppHeader screen="Quick estimate" menu={<UserMenu />} />
      <main className="mx-auto flex w-full max-w-6xl flex-col gap-4 px-4 py-6">
        <div>
          <h1 className="text-2xl font-semibold">Quick estimate</h1>
          <p className="mt-1 max-w-3xl text-ink-soft">
            Soil loss by RUSLE (A = R × K × LS × C × P) and storm runoff by the curve-number method, for one slope you
            describe. Inputs are in SI units; the results show in SI or US units.
          </p>
        </div>
        <EstimateWorkspace defaultUnits={me.data?.units === 'ac' ? 'us' : 'si'} />
      </main>
    </div>
  );
}

export default EstimatePage;
