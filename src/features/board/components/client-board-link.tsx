// On the Farms screen, for someone who advises at least one farm: the board across all of
// their client farms.
import { Link } from 'react-router-dom';
import { paths } from '../../../lib/paths';
import { useFarms } from '../../farms/api/get-farms';

export function ClientBoardLink() {
  const farms = useFarms();
  const clients = farms.data?.filter((f) => f.role === 'advisor').length ?? 0;
  if (clients === 0) return null;
  return (
    <Link
      to={paths.clientBoard.getHref()}
      data-testid="client-board-link"
      className="flex flex-col gap-1 rounded-lg border border-clay bg-clay-light/60 px-4 py-3 hover:bg-clay-light"
    >
      <span className="font-serif text-lg font-semibold text-clay-dark">All my client farms: Priority board</span>
      <span className="text-sm text-ink-soft">
        Every field of the <span className="num">{clients}</span> farm{clients === 1 ? '' : 's'} you advise, ranked together.
      </span>
    </Link>
  );
}
