// The bar across every signed-in screen: product name, the farm in view, and a slot for the user menu.
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../lib/paths';

export function AppHeader({ farmName, screen, menu }: { farmName?: string; screen: string; menu?: ReactNode }) {
  return (
    <header className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-paper-edge bg-paper px-4 py-2">
      <Link to={paths.farms.getHref()} className="font-serif text-xl font-semibold tracking-tight text-clay-dark">
        Fieldshed
      </Link>
      <nav aria-label="Where you are" className="flex min-w-0 items-center gap-2 text-sm text-ink-soft">
        <span aria-hidden="true">/</span>
        <span>{screen}</span>
        {farmName ? (
          <>
            <span aria-hidden="true">/</span>
            <span className="truncate font-semibold text-ink" data-testid="farm-name">
              {farmName}
            </span>
          </>
        ) : null}
      </nav>
      <div className="ml-auto">{menu}</div>
    </header>
  );
}
