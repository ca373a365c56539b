// The Field screen: one field, its season, and the tabs Outline · Ground · Soil · Cropping ·
// Risk, with a small map of the field beside them. The Outline tab comes with the screen; the
// others load when first opened, so their forms, charts and the engine are not fetched before it.
import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import { isApiError } from '../../../lib/api-client';
import { paths } from '../../../lib/paths';
import { formatArea } from '../../../lib/units';
import type { Farm, Units } from '../../../../shared/schemas/auth';
import { RiskBadge } from '../../../components/risk/risk-badge';
import { lossFigure } from '../../../lib/loss-units';
import { useBasemap } from '../../config/use-basemap';
import { RoleBadge } from '../../farms/components/role-badge';
import { useField } from '../../fields/api/get-field';
import { useFields } from '../../fields/api/get-fields';
import { useAssessment } from '../../seasons/api/get-assessment';
import { SeasonPicker } from '../../seasons/components/season-picker';
import { useSeasonChoice } from '../../seasons/components/use-season-choice';
import { FieldMiniMap } from './field-mini-map';
import { FIELD_TABS, useFieldTab } from './field-tabs';
import { OutlineTab } from './outline-tab';
import { OptionExtraContext, type OptionExtra } from './option-extra';

const GroundTab = lazy(() => import('./ground-tab').then((m) => ({ default: m.GroundTab })));
const SoilTab = lazy(() => import('../../soils/components/soil-tab').then((m) => ({ default: m.SoilTab })));
const CroppingPanel = lazy(() => import('../../seasons/components/cropping-form').then((m) => ({ default: m.CroppingPanel })));
const RiskTab = lazy(() => import('./risk-tab').then((m) => ({ default: m.RiskTab })));

type Props = { farm: Farm; fieldId: number; units: Units; optionExtra?: OptionExtra };

export function FieldScreen({ farm, fieldId, units, optionExtra }: Props) {
  const field = useField(fieldId);
  const fields = useFields(farm.id);
  const { basemap } = useBasemap();
  const { seasons, season, setSeason } = useSeasonChoice(farm.id);
  const [tab, setTab] = useFieldTab();
  const assessment = useAssessment(fieldId, season);
  const role = farm.role;
  const canEdit = role === 'farmer' || role === 'advisor';

  if (field.isPending) return <Loading label="Opening the field…" />;
  if (field.isError || field.data.properties.farmId !== farm.id)
    return (
      <main className="mx-auto w-full max-w-2xl p-6">
        <Notice tone="error" title="This field cannot be opened">
          {field.isError && !isApiError(field.error, 404) ? field.error.message : 'There is no such field on this farm, or it is not one of yours.'}
        </Notice>
        <Link to={paths.board.getHref(farm.id)} className="mt-4 inline-block font-semibold text-clay-dark underline">
          Back to the Priority board
        </Link>
      </main>
    );

  const f = field.data;
  const a = assessment.data;
  const needsSeason = tab === 'cropping' || tab === 'risk';

  return (
    <div className="flex min-h-0 flex-1 flex-col overflow-y-auto lg:flex-row lg:overflow-hidden">
      <main className="flex min-w-0 flex-1 flex-col gap-4 p-4 lg:overflow-y-auto">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div className="flex flex-col gap-1">
            <p className="text-xs font-semibold uppercase tracking-wide text-clay-dark">Field</p>
            <div className="flex flex-wrap items-center gap-2">
              <h1 className="text-2xl font-semibold" data-testid="field-name">
                {f.properties.name}
              </h1>
              <RoleBadge role={role} />
            </div>
          </div>
          <SeasonPicker farmId={farm.id} seasons={seasons.data ?? []} season={season} onChange={setSeason} canAdd={role === 'farmer'} />
        </div>
        {role === 'landowner' ? (
          <Notice testId="landowner-banner" title="Landowner view">
            You see this field because it is yours. Everything here is read only.
          </Notice>
        ) : null}

        <div role="tablist" aria-label="About this field" className="flex flex-wrap gap-1 border-b border-paper-edge">
          {FIELD_TABS.map((t) => {
            const active = t.key === tab;
            return (
              <button
                key={t.key}
                type="button"
                role="tab"
                id={`field-tab-${t.key}`}
                aria-selected={active}
                aria-controls="field-tab-panel"
                data-testid={`field-tab-${t.key}`}
                onClick={() => setTab(t.key)}
                className={`-mb-px rounded-t-md border px-3 py-1.5 text-sm font-semibold ${
                  active ? 'border-paper-edge border-b-paper bg-paper text-clay-dark' : 'border-transparent text-ink-soft hover:text-ink'
                }`}
              >
                {t.label}
              </button>
            );
          })}
        </div>

        <div role="tabpanel" id="field-tab-panel" aria-labelledby={`field-tab-${tab}`} className="min-w-0">
          <Suspense fallback={<Loading label="Opening the tab…" />}>
            {needsSeason && !season ? (
              seasons.isPending ? (
                <Loading label="Loading the seasons…" />
              ) : (
                <Notice tone="caution" testId="no-season">
                  This farm has no season yet.{role === 'farmer' ? ' Add one above to record cropping and see the risk.' : ' The farmer adds seasons.'}
                </Notice>
              )
            ) : tab === 'outline' ? (
              <OutlineTab field={f} units={units} />
            ) : tab === 'ground' ? (
              <GroundTab field={f} canEdit={canEdit} units={units} />
            ) : tab === 'soil' ? (
              <SoilTab fieldId={f.id} farmId={farm.id} role={role} />
            ) : tab === 'cropping' ? (
              <CroppingPanel fieldId={f.id} season={season!} canEdit={canEdit} units={units} />
            ) : (
              <OptionExtraContext.Provider value={optionExtra ?? null}>
                <RiskTab farmId={farm.id} fieldId={f.id} season={season!} units={units} canEdit={canEdit} onOpenTab={setTab} />
              </OptionExtraContext.Provider>
            )}
          </Suspense>
        </div>
      </main>

      <aside
        aria-label="The field on the map"
        className="flex w-full shrink-0 flex-col gap-3 border-t border-paper-edge bg-paper p-4 lg:w-96 lg:overflow-y-auto lg:border-l lg:border-t-0"
      >
        <FieldMiniMap
          field={f}
          others={fields.data?.features ?? []}
          fillColour={a?.riskClass?.colour ?? null}
          basemap={basemap}
        />
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="field-side-facts">
          <dt className="text-ink-soft">Area</dt>
          <dd className="num">{formatArea(f.properties.areaHa, units)}</dd>
          {season ? (
            <>
              <dt className="text-ink-soft">Risk, {season}</dt>
              <dd>
                {a ? <RiskBadge riskClass={a.riskClass} /> : <span className="text-ink-soft">{assessment.isPending ? 'working out…' : '—'}</span>}
              </dd>
              {a?.soilLossTPerHaYr != null ? (
                <>
                  <dt className="text-ink-soft">A</dt>
                  <dd className="num">{lossFigure(a.soilLossTPerHaYr, units).main}</dd>
                </>
              ) : null}
            </>
          ) : null}
        </dl>
        <nav aria-label="Elsewhere" className="flex flex-col gap-1 text-sm">
          <Link to={paths.farmMap.getHref(farm.id)} className="font-semibold text-clay-dark underline underline-offset-2" data-testid="field-farm-map-link">
            Back to the Farm map
          </Link>
          <Link to={paths.board.getHref(farm.id, season)} className="font-semibold text-clay-dark underline underline-offset-2" data-testid="field-board-link">
            Priority board{season ? `, ${season}` : ''}
          </Link>
        </nav>
      </aside>
    </div>
  );
}
