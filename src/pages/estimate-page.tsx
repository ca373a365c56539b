// Estimate: a soil-loss estimate without a field. A placeholder until the engine's form lands.
import { Link } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { UserMenu } from '../features/auth/components/user-menu';
import { paths } from '../lib/paths';

export function EstimatePage() {
  return (
    <div className="flex min-h-full flex-col">
      <AppHeader screen="Estimate" menu={<UserMenu />} />
      <main className="mx-auto w-full max-w-2xl px-4 py-6">
        <h1 className="text-2xl font-semibold">Estimate</h1>
        <p className="mt-2 text-ink-soft">
          A quick soil-loss estimate from typed slope, soil and cover values will live here.
        </p>
        <Link to={paths.farms.getHref()} className="mt-4 inline-block font-semibold text-clay-dark underline">
          Back to your farms
        </Link>
      </main>
    </div>
  );
}
