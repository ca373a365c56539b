// The selected field's terrain figures from the farm's elevation model: mean and
// 90th-percentile slope, mean LS, the slope-class shares as a bar chart, how many cells
// they rest on, and where water gathers. Without a covering model, says to type the slope.
import { Notice } from '../../../components/ui/notice';
import { formatArea } from '../../../lib/units';
import type { Units } from '../../../../shared/schemas/auth';
import { isNoTerrain, isTerrainPending, useFieldTerrain } from '../api/get-field-terrain';
import { useLayers } from '../api/get-layers';
import { FLOW_COLOUR, FLOW_LABEL } from './flow-points-layer';
import { LegendSwatch } from './legend-swatch';
import { SlopeClassChart } from './slope-class-chart';
import { M2_PER_HA } from '../../../../shared/erosion/units';

const fmt = (x: number, digits: number) =>
  x.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

type Props = { fieldId: number; fieldVersion: number; farmId: number; units: Units };

export function FieldTerrainFigures({ fieldId, fieldVersion, farmId, units }: Props) {
  const terrain = useFieldTerrain({ id: fieldId, version: fieldVersion });
  const layers = useLayers(farmId);
  const slopeLegend = layers.data?.find((l) => l.key === 'slope-classes')?.legend;

  return (
    <section aria-labelledby="field-terrain-heading" data-testid="field-terrain" className="mt-3 flex flex-col gap-2 border-t border-paper-edge pt-2">
      <h3 id="field-terrain-heading" className="text-base font-semibold">
        Terrain
      </h3>
      {terrain.isPending ? (
        <p className="text-sm text-ink-soft">Loading the slope figures…</p>
      ) : terrain.isError ? (
        isTerrainPending(terrain.error) ? (
          <p className="text-sm text-ink-soft" data-testid="field-terrain-pending">
            The slope figures are being worked out from the elevation model…
          </p>
        ) : isNoTerrain(terrain.error) ? (
          <p className="text-sm text-ink-soft" data-testid="field-terrain-none">
            No elevation model covers this field yet — type the slope on the Ground tab.
          </p>
        ) : (
          <Notice tone="error">{terrain.error.message}</Notice>
        )
      ) : (
        <>
          {terrain.data.stale ? (
            <Notice tone="caution" testId="field-terrain-outdated">
              The last terrain run stopped before it finished, so these figures may not match the farm's elevation model
              or slope classes. Run it again, for example by saving the slope classes.
            </Notice>
          ) : !terrain.data.upToDate ? (
            <Notice tone="caution" testId="field-terrain-outdated">
              These figures are for the field's previous outline; new ones are being worked out.
            </Notice>
          ) : null}
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-ink-soft">Mean slope</dt>
            <dd className="num" data-testid="terrain-mean-slope">{fmt(terrain.data.meanSlopePct, 1)} %</dd>
            <dt className="text-ink-soft">90th-percentile slope</dt>
            <dd className="num" data-testid="terrain-p90-slope">{fmt(terrain.data.p90SlopePct, 1)} %</dd>
            <dt className="text-ink-soft">Mean LS factor</dt>
            <dd className="num" data-testid="terrain-mean-ls">
              {fmt(terrain.data.meanLS, 2)} <span className="text-ink-soft">(no unit)</span>
            </dd>
            {terrain.data.meanSoilLossTPerHaYr !== null ? (
              <>
                <dt className="text-ink-soft">Mean soil loss, grid</dt>
                <dd className="num">{fmt(terrain.data.meanSoilLossTPerHaYr, 1)} t/ha/yr</dd>
              </>
            ) : null}
            <dt className="text-ink-soft">Based on</dt>
            <dd className="num" data-testid="terrain-cells">
              {terrain.data.cellCount.toLocaleString('en-US')} cells of {fmt(terrain.data.cellSizeM, terrain.data.cellSizeM < 10 ? 1 : 0)} m
              <span className="text-ink-soft">
                {' '}
                ({formatArea((terrain.data.cellCount * terrain.data.cellSizeM ** 2) / M2_PER_HA, units)})
              </span>
            </dd>
            {terrain.data.cellsWithoutData > 0 ? (
              <>
                <dt className="text-ink-soft">Cells without height</dt>
                <dd className="num">{terrain.data.cellsWithoutData.toLocaleString('en-US')} cells</dd>
              </>
            ) : null}
          </dl>
          <SlopeClassChart classes={terrain.data.slopeClasses} legend={slopeLegend} />
          <div className="flex items-start gap-2 text-sm" data-testid="terrain-flow">
            <span className="mt-0.5">
              <LegendSwatch colour={FLOW_COLOUR} shape="dot" />
            </span>
            <p>
              {FLOW_LABEL}:{' '}
              {terrain.data.concentratedFlow.cellCount > 0 ? (
                <span className="num">
                  {terrain.data.concentratedFlow.cellCount.toLocaleString('en-US')} cells, each draining over{' '}
                  {formatArea(terrain.data.concentratedFlow.minAreaM2 / M2_PER_HA, units)}
                </span>
              ) : (
                <span>none on this field (no cell drains over {formatArea(terrain.data.concentratedFlow.minAreaM2 / M2_PER_HA, units)}).</span>
              )}
            </p>
          </div>
        </>
      )}
    </section>
  );
}
