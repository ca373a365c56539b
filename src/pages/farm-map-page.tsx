// Farm map, the home of a farm. Loaded lazily: Leaflet and the drawing plugin are large.
import { useParams } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { Notice } from '../components/ui/notice';
import { CannotOpen } from '../components/cannot-open';
import { Loading } from '../components/ui/spinner';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { NO_BASEMAP, useBasemap } from '../features/config/use-basemap';
import { BasemapControl } from '../components/map/basemap-control';
import { PlaceSearch } from '../features/places/components/place-search';
import { useFarm } from '../features/farms/api/get-farm';
import { RoleBadge } from '../features/farms/components/role-badge';
import { FarmMapWorkspace } from '../features/fields/components/farm-map-workspace';
import { ElevationPanel } from '../features/terrain/components/elevation-panel';
import { SoilMapPanel } from '../features/soils/components/soil-map-panel';
import { RecentChanges } from '../features/changes/components/recent-changes';
import { FieldTerrainFigures } from '../features/terrain/components/field-terrain-figures';
import { TerrainMapLayers } from '../features/terrain/components/terrain-map-layers';
import { useSeasonChoice } from '../features/seasons/components/use-season-choice';
import { useSeasonPlan } from '../features/plans/api/get-season-plan';
import { FarmFiles } from '../features/reports/components/farm-files';
import { PlanReportButton } from '../features/reports/components/plan-report-button';
import type { Role } from '../../shared/schemas/auth';

function RoleBanner({ role }: { role: Role }) {
  if (role === 'landowner')
    return (
      <Notice testId="landowner-banner" title="Landowner view">
        You see the fields you own on this farm. The map is read only.
      </Notice>
    );
  if (role === 'advisor')
    return (
      <Notice testId="advisor-banner">You advise this farm: you see all of its fields. The map is read only.</Notice>
    );
  return null;
}

export function FarmMapPage() {
  const farmId = Number(useParams().farmId);
  const farm = useFarm(farmId);
  const me = useMe();
  const base = useBasemap();
  // Files are made for the season in the address (?season=), else the newest; the plan's report where it has one.
  const { season } = useSeasonChoice(farmId);
  const plan = useSeasonPlan(farmId, season);

  const header = (
    <AppHeader screen={farm.data?.role === 'landowner' ? 'Landowner view' : 'Farm map'} farmName={farm.data?.name} role={farm.data?.role} menu={<UserMenu />} />
  );

  if (!Number.isInteger(farmId) || farmId <= 0 || farm.isError) {
    return <CannotOpen header={header} title="This farm cannot be opened" error={farm.error} notFoundText="There is no such farm, or you are not a member of it." />;
  }

  const units = me.data?.units ?? 'ha';

  return (
    <div className="flex h-full flex-col">
      {header}
      {farm.isPending || !me.data ? (
        <Loading label="Opening the farm…" />
      ) : (
        <FarmMapWorkspace
          farmId={farmId}
          farmBbox={farm.data.bbox}
          canEdit={farm.data.role === 'farmer'}
          units={me.data.units}
          mapLayers={(selected) => (
            <>
              <BasemapControl basemaps={base.basemaps} basemap={base.basemap} chosenKey={base.chosenKey} onChoose={base.choose} noneKey={NO_BASEMAP} />
              <PlaceSearch />
              <TerrainMapLayers
                farmId={farmId}
                overBasemap={base.basemap !== null}
                selectedField={
                  selected ? { id: selected.id, version: selected.properties.version, name: selected.properties.name } : null
                }
              />
            </>
          )}
          fieldExtra={(field) => (
            <FieldTerrainFigures fieldId={field.id} fieldVersion={field.properties.version} farmId={farmId} units={units} />
          )}
          panelSections={
            <>
              {season ? (
                <FarmFiles farmId={farmId} season={season} planReport={plan.data ? <PlanReportButton planId={plan.data.id} season={plan.data.season} /> : null} />
              ) : null}
              {/* A landowner sees their own fields, not the farm's survey data. */}
              {farm.data.role === 'landowner' ? null : (
                <>
                  <ElevationPanel farmId={farmId} canEdit={farm.data.role === 'farmer'} />
                  <SoilMapPanel farmId={farmId} role={farm.data.role} />
                  <RecentChanges farmId={farmId} />
                </>
              )}
            </>
          }
          banner={
            <div className="flex flex-col gap-2">
              <div className="flex items-center gap-2">
                <h1 className="text-xl font-semibold">{farm.data.name}</h1>
                <RoleBadge role={farm.data.role} />
              </div>
              <RoleBanner role={farm.data.role} />
            </div>
          }
        />
      )}
    </div>
  );
}

export default FarmMapPage;
