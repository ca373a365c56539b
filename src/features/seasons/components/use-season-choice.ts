// The season in view, kept in the URL (?season=2027) so a link opens the same season; without
// one (or with one the farm does not have), the farm's current season (the newest holding
// cropping or a plan, as the server marks it), never an empty newer one.
import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useSeasons } from '../api/get-seasons';

export function useSeasonChoice(farmId: number) {
  const [params, setParams] = useSearchParams();
  const seasons = useSeasons(farmId);
  const wanted = params.get('season');
  const list = seasons.data ?? [];
  const season = wanted && list.some((s) => s.label === wanted) ? wanted : (list.find((s) => s.current)?.label ?? list[0]?.label ?? null);
  const setSeason = useCallback(
    (label: string) =>
      setParams(
        (p) => {
          const next = new URLSearchParams(p);
          next.set('season', label);
          return next;
        },
        { replace: true },
      ),
    [setParams],
  );
  return { seasons, season, setSeason };
}
