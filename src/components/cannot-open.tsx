// The page a farm-scoped screen shows when its farm (or field) cannot be opened: a 404 says
// "no such thing, or not yours"; any other error says what went wrong.
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from './ui/notice';
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
