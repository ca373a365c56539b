// The priority board: the ranked table beside the choropleth of the same fields, and the
// chart of A against T under them. Picking a row outlines the field on the map (and picking a
// field on the map picks its row); the picked field opens on the Field screen. On one farm's
// board, farmers and advisors can switch the table to each field's best treatment and its cost.
import { useCallback, useMemo, useState, lazy, Suspense } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Notice } from '../../../components/ui/notice';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../lib/paths';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import { useFarmTreatments } from '../api/get-farm-treatments';
import { BoardMap } from './board-map';
import { BoardTable, type RankedRow } from './board-table';
import { lossFigure } from '../../../lib/loss-units';
import { BoardCsvButton } from './board-csv-button';
import { RiskBadge } from '../../../components/risk/risk-badge';
import { RiskLegend } from '../../../components/risk/risk-legend';
import type { BoardTreatments } from './treatment-columns';

// Loaded on first use: charts (recharts) load with the chart, not with the board.
const AVsTChart = lazy(() => import('./a-vs-t-chart').then((m) => ({ default: m.AVsTChart })));

const LOSS_UNIT_CHOICES: { value: Units; label: string }[] = [
  { value: 'ha', label: 't/ha/yr, mm' },
  { value: 'ac', label: 'US t/ac/yr, in' },
];

type Props = {
  rows: BoardRow[];
  fields: FieldFeature[];
  units: Units;
  season: string | null;
  showFarm?: boolean;
  tileUrl?: string | null;
  tileAttribution?: string | null;
  /** The farm whose treatments the table may show (one farm's board, farmer or advisor); none hides the switch. */
  treatmentsFarmId?: number;
  /** Names the board's CSV file: the farm's name, or "client farms" on an advisor's board. */
  fileStem: string;
};

type TableView = 'risk' | 'treatments';
const VIEW_CHOICES: { value: TableView; label: string }[] = [
  { value: 'risk', label: 'Risk figures' },
  { value: 'treatments', label: 'Best treatment and cost' },
];

const pill = (on: boolean) =>
  `rounded border px-2 py-0.5 font-medium ${on ? 'border-clay-dark bg-clay text-paper' : 'border-ink-faint bg-paper text-ink hover:bg-paper-deep'}`;

export function BoardWorkspace({ rows, fields, units, season, showFarm = false, tileUrl, tileAttribution, treatmentsFarmId, fileStem }: Props) {
  const navigate = useNavigate();
  const [view, setView] = useState<TableView>('risk');
  const treatmentsQuery = useFarmTreatments(treatmentsFarmId ?? 0, season, treatmentsFarmId !== undefined && view === 'treatments');
  const treatments: BoardTreatments | null = useMemo(() => {
    const t = treatmentsQuery.data;
    return view === 'treatments' && t ? { currency: t.currency, byField: new Map(t.fields.map((f) => [f.fieldId, f])) } : null;
  }, [view, treatmentsQuery.data]);
  const [selectedId, setSelectedId] = useState<number | null>(null);
  // Follows the user's area setting until the board's own toggle is used.
  const [lossChoice, setLossUnits] = useState<Units | null>(null);
  const lossUnits = lossChoice ?? units;
  const ranked: RankedRow[] = useMemo(() => rows.map((r, i) => ({ ...r, rank: i + 1 })), [rows]);
  const selected = ranked.find((r) => r.fieldId === selectedId) ?? null;
  const counts = useMemo(() => {
    const m = new Map<string, number>();
    for (const r of rows) m.set(r.riskClass?.key ?? 'not-assessed', (m.get(r.riskClass?.key ?? 'not-assessed') ?? 0) + 1);
    return m;
  }, [rows]);
  const onMapSelect = useCallback((id: number) => setSelectedId(id), []);
  const open = (r: BoardRow) => navigate(paths.field.getHref(r.farmId, r.fieldId, { tab: 'risk', season: showFarm ? null : season }));

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div role="group" aria-label="Units of soil loss" className="flex flex-wrap items-center gap-1 text-sm" data-testid="board-loss-units">
          <span className="text-ink-soft">Soil loss and runoff in</span>
          {LOSS_UNIT_CHOICES.map((c) => (
            <button
              key={c.value}
              type="button"
              aria-pressed={lossUnits === c.value}
              onClick={() => setLossUnits(c.value)}
              data-testid={`board-loss-units-${c.value === 'ha' ? 'si' : 'us'}`}
              className={pill(lossUnits === c.value)}
            >
              {c.label}
            </button>
          ))}
          <span className="text-xs text-ink-soft">(hover a figure for the other units)</span>
        </div>
        <BoardCsvButton rows={rows} units={units} lossUnits={lossUnits} showFarm={showFarm} season={season} fileStem={fileStem} />
      </div>
      {treatmentsFarmId !== undefined ? (
        <div className="flex flex-col gap-2">
          <div role="group" aria-label="What the table shows" className="flex flex-wrap items-center gap-1 text-sm" data-testid="board-view">
            <span className="text-ink-soft">The table shows</span>
            {VIEW_CHOICES.map((c) => (
              <button key={c.value} type="button" aria-pressed={view === c.value} onClick={() => setView(c.value)} data-testid={`board-view-${c.value}`} className={pill(view === c.value)}>
                {c.label}
              </button>
            ))}
            <Link to={paths.budget.getHref(treatmentsFarmId, season)} className="ml-2 font-semibold text-clay-dark underline underline-offset-2" data-testid="board-budget-link">
              Plan a budget for these treatments
            </Link>
          </div>
          {view === 'treatments' && treatmentsQuery.isPending ? <p className="text-sm text-ink-soft">Working out each field’s treatments…</p> : null}
          {view === 'treatments' && treatmentsQuery.isError ? (
            <Notice tone="error" title="The treatments could not be worked out">
              {treatmentsQuery.error.message}
            </Notice>
          ) : null}
          {treatments ? (
            <p className="text-xs text-ink-soft" data-testid="board-treatments-note">
              Best treatment: the cheapest that brings A under T, else the one saving the most soil for the money. Costs at the farm’s prices,
              in {treatments.currency}; open a field’s Risk tab for every option, its amounts and its cautions.
            </p>
          ) : null}
        </div>
      ) : null}
      <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_minmax(320px,28%)]">
        <BoardTable
          rows={ranked}
          units={units}
          lossUnits={lossUnits}
          selectedId={selectedId}
          onSelect={(r) => setSelectedId(r.fieldId)}
          showFarm={showFarm}
          treatments={treatments}
        />
        <div className="flex flex-col gap-2 xl:sticky xl:top-2 xl:self-start">
          <div className="flex min-h-12 flex-wrap items-center gap-2 rounded-md border border-paper-edge bg-white/50 px-3 py-2 text-sm print:hidden" data-testid="board-selection" aria-live="polite">
            {selected ? (
              <>
                <span className="num font-semibold">{selected.rank}.</span>
                <span className="font-semibold">{selected.name}</span>
                <RiskBadge riskClass={selected.riskClass} />
                {selected.soilLossTPerHaYr !== null ? <span className="num text-ink-soft">{lossFigure(selected.soilLossTPerHaYr, lossUnits).main}</span> : null}
                <Button size="sm" className="ml-auto" onClick={() => open(selected)} data-testid="board-open-field">
                  Open the Field screen
                </Button>
              </>
            ) : (
              <span className="text-ink-soft">Pick a row or a field on the map to see it here.</span>
            )}
          </div>
          {/* A live map does not redraw for paper: the table and the chart carry the same figures there. */}
          <div className="h-[420px] overflow-hidden rounded-md border border-paper-edge print:hidden">
            <BoardMap fields={fields} rows={rows} selectedId={selectedId} onSelect={onMapSelect} tileUrl={tileUrl} tileAttribution={tileAttribution} />
          </div>
          <RiskLegend counts={counts} />
        </div>
      </div>
      <div className="max-w-4xl">
        <Suspense fallback={null}>
          <AVsTChart rows={rows} units={lossUnits} showFarm={showFarm} />
        </Suspense>
      </div>
    </div>
  );
}
