// A web basemap under a map, with its attribution, telling its parent whether the tile service is
// reached: the service is "unreachable" when tiles of a fresh batch fail and none of it loads
// (no network, a firewall, the service down). Leaflet asks again for tiles whenever the view
// moves; a new `attempt` asks again for the whole view.
import { useRef } from 'react';
import { TileLayer } from 'react-leaflet';
import { useLatest } from '../../lib/use-latest';
import type { Basemap } from '../../../shared/schemas/config';

export type BasemapReach = 'loading' | 'reached' | 'unreachable';

/** Failed tiles, with none loaded, before the service counts as out of reach. */
const FAILURES_BEFORE_UNREACHABLE = 2;

type Props = { basemap: Basemap; attempt?: number; onReach?: (reach: BasemapReach) => void };

export function BasemapTiles({ basemap, attempt = 0, onReach }: Props) {
  const report = useLatest(onReach);
  const batch = useRef({ loaded: 0, failed: 0 });
  return (
    <TileLayer
      key={`${basemap.key}:${basemap.url}:${attempt}`}
      url={basemap.url}
      attribution={basemap.attribution}
      maxNativeZoom={basemap.maxNativeZoom}
      maxZoom={19}
      className="fs-basemap"
      eventHandlers={{
        loading: () => {
          batch.current = { loaded: 0, failed: 0 };
        },
        tileload: () => {
          batch.current.loaded += 1;
          report.current?.('reached');
        },
        tileerror: () => {
          batch.current.failed += 1;
          if (batch.current.loaded === 0 && batch.current.failed >= FAILURES_BEFORE_UNREACHABLE) report.current?.('unreachable');
        },
      }}
    />
  );
}
