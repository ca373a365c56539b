// Farms: every farm the user belongs to, with their role on it.
import { Link } from 'react-router-dom';
import { Loading } from '../../../components/ui/spinner';
import { Notice } from '../../../components/ui/notice';
import { paths } from '../../../lib/paths';
import { useFarms } from '../api/get-farms';
import { RoleBadge } from './role-badge';

const ROLE_HINTS = {
  farmer: 'You run this farm: draw, import and change its fields.',
  advisor: 'You advise this farm: you see all of its fields.',
  landowner: 'You own land here: you see the approved plan for the fields that are yours.',
} as const;

export function FarmList() {
  const farms = useFarms();
  if (farms.isPending) return <Loading label="Loading your farms…" />;
  if (farms.isError) return <Notice tone="error" title="Your farms could not be loaded">{farms.error.message}</Notice>;
  if (farms.data.length === 0)
    return <Notice>You are not a member of any farm yet. A farmer can invite you to theirs.</Notice>;

  return (
    <ul className="flex flex-col gap-3" aria-label="Your farms">
      {farms.data.map((farm) => (
        <li key={farm.id}>
          <Link
            // A landowner comes for the approved plan of their fields: straight to it.
            to={farm.role === 'landowner' ? paths.landownerPlan.getHref(farm.id) : paths.farmMap.getHref(farm.id)}
            data-testid="farm-row"
            className="flex flex-col gap-1 rounded-lg border border-paper-edge bg-white/50 px-4 py-3 hover:border-clay hover:bg-white/80"
          >
            <span className="flex items-center gap-3">
              <span className="font-serif text-lg font-semibold">{farm.name}</span>
              <RoleBadge role={farm.role} />
            </span>
            <span className="text-sm text-ink-soft">{ROLE_HINTS[farm.role]}</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
