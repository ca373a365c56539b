// The bar across every signed-in screen: product name, the farm in view, the quick-estimate
// link and a slot for the user menu. On a phone the links and the menu share one row that scrolls sideways.
import type { ReactNode } from 'react';
import type { Role } from '../../shared/schemas/auth';
import { Link, NavLink, useMatch } from 'react-router-dom';
import { paths } from '../lib/paths';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `rounded px-2 py-0.5 text-sm font-semibold underline-offset-2 hover:underline ${
    isActive ? 'bg-clay-light text-clay-dark' : 'text-clay-dark'
  }`;

type Props = {
  farmName?: string;
  /** The screen's name; on one thing's screen (a field), that thing's name instead. */
  screen: string;
  /** The caller's role on the farm in view: farmers and advisors also get Treatments and budget and the Season plan; a landowner the approved plan. */
  role?: Role;
  menu?: ReactNode;
};

export function AppHeader({ farmName, screen, role, menu }: Props) {
  // On a farm's screens, links to the farm's map, its priority board, and the budget and season plan
  // (for a landowner, the approved plan instead).
  const farmId = useMatch('/farms/:farmId/*')?.params.farmId;
  return (
    <header className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-paper-edge bg-paper px-4 py-2">
      <Link to={paths.farms.getHref()} className="font-serif text-xl font-semibold tracking-tight text-clay-dark">
        Fieldshed
      </Link>
      {/* Where you are, widest first: the farm (a link to its map), then the screen or the field. */}
      <nav aria-label="Where you are" className="flex min-w-0 items-center gap-2 text-sm text-ink-soft">
        {farmName ? (
          <>
            <span aria-hidden="true">/</span>
            {farmId && /^\d+$/.test(farmId) ? (
              <Link to={paths.farmMap.getHref(farmId)} className="truncate font-semibold text-ink hover:underline" data-testid="farm-name">
                {farmName}
              </Link>
            ) : (
              <span className="truncate font-semibold text-ink" data-testid="farm-name">
                {farmName}
              </span>
            )}
          </>
        ) : null}
        <span aria-hidden="true">/</span>
        <span className="truncate" data-testid="screen-name">
          {screen}
        </span>
      </nav>
      <div className="ml-auto flex flex-wrap items-center gap-x-2 gap-y-2 max-sm:-mx-4 max-sm:w-[calc(100%+2rem)] max-sm:flex-nowrap max-sm:overflow-x-auto max-sm:whitespace-nowrap max-sm:px-4 max-sm:pb-1">
        {farmId && /^\d+$/.test(farmId) ? (
          <>
            <NavLink to={paths.farmMap.getHref(farmId)} end data-testid="nav-farm-map" className={navClass}>
              Farm map
            </NavLink>
            <NavLink to={paths.board.getHref(farmId)} data-testid="nav-board" className={navClass}>
              Priority board
            </NavLink>
            <NavLink to={paths.people.getHref(farmId)} data-testid="nav-people" className={navClass}>
              People
            </NavLink>
            {role === 'farmer' || role === 'advisor' ? (
              <>
                <NavLink to={paths.budget.getHref(farmId)} data-testid="nav-budget" className={navClass}>
                  Treatments and budget
                </NavLink>
                <NavLink to={paths.plan.getHref(farmId)} data-testid="nav-plan" className={navClass}>
                  Season plan
                </NavLink>
              </>
            ) : role === 'landowner' ? (
              <NavLink to={paths.landownerPlan.getHref(farmId)} data-testid="nav-landowner-plan" className={navClass}>
                Approved plan
              </NavLink>
            ) : null}
          </>
        ) : null}
        <NavLink
          to={paths.estimate.getHref()}
          data-testid="nav-estimate"
          className={({ isActive }) =>
            `rounded px-2 py-0.5 text-sm font-semibold underline-offset-2 hover:underline ${
              isActive ? 'bg-clay-light text-clay-dark' : 'text-clay-dark'
            }`
          }
        >
          Quick estimate
        </NavLink>
        {menu}
      </div>
    </header>
  );
}
