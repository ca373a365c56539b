// The page a farm-scoped screen shows when its farm (or field) cannot be opened: a 404 says
// "no such thing, or not yours"; any other error says what went wrong.
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from './ui/notice';
import { Loading } from './ui/spinner';
import { isApiError } from '../lib/api-client';
import { paths } from '../lib/paths';

export function CannotOpen({ header, title, error, notFoundText }: { header: ReactNode; title: string; error: unknown; notFoundText: string }) {
  const message = error instanceof Error && !isApiError(error, 404) ? error.message : notFoundText;
  return (
    <div className="flex min-h-full flex-col">
      {header}
      <main className="mx-auto w-full max-w-2xl p-6">
        <Notice tone="error" title={title}>
          {message}
        </Notice>
        <Link to={paths.farms.getHref()} className="mt-4 inline-block font-semibold text-clay-dark underline">
          Back to your farms
        </Link>
      </main>
    </div>
  );
}

/**
 * What a farm screen shows before its own content: the farm cannot be opened, or it (or the
 * signed-in person) is still loading. Null once both are there.
 */
export function farmScreenWaiting(args: {
  farmId: number;
  farm: { isError: boolean; isPending: boolean; error: unknown };
  meLoaded: boolean;
  header: ReactNode;
  title: string;
  loadingLabel: string;
}): ReactNode | null {
  const { farmId, farm, header } = args;
  if (!Number.isInteger(farmId) || farmId <= 0 || farm.isError)
    return <CannotOpen header={header} title={args.title} error={farm.error} notFoundText="There is no such farm, or you are not a member of it." />;
  if (farm.isPending || !args.meLoaded)
    return (
      <div className="flex min-h-full flex-col">
        {header}
        <Loading label={args.loadingLabel} />
      </div>
    );
  return null;
}
