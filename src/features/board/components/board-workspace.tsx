// The priority board: the ranked table beside the choropleth of the same fields, and the
// chart of A against T under them. Picking a row outlines the field on the map (and picking a
// field on the map picks its row); the picked field opens on the Field screen.
import { useCallback, useMemo, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../lib/paths';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import { AVsTChart } from './a-vs-t-chart';
import { BoardMap } from './board-map';
import { BoardTable, type RankedRow } from './board-table';
import { lossFigure } from '../../../lib/loss-units';
import { RiskBadge } from './risk-badge';
import { RiskLegend } from './risk-legend';

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
};

export function BoardWorkspace({ rows, fields, units, season, showFarm = false, tileUrl, tileAttribution }: Props) {
  const navigate = useNavigate();
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
      <div role="group" aria-label="Units of soil loss" className="flex items-center gap-1 text-sm" data-testid="board-loss-units">
        <span className="text-ink-soft">Soil loss and runoff in</span>
        {LOSS_UNIT_CHOICES.map((c) => (
          <button
            key={c.value}
            type="button"
            aria-pressed={lossUnits === c.value}
            onClick={() => setLossUnits(c.value)}
            data-testid={`board-loss-units-${c.value === 'ha' ? 'si' : 'us'}`}
            className={`rounded border px-2 py-0.5 font-medium ${
              lossUnits === c.value ? 'border-clay-dark bg-clay text-paper' : 'border-ink-faint bg-paper text-ink hover:bg-paper-deep'
            }`}
          >
            {c.label}
          </button>
        ))}
        <span className="text-xs text-ink-soft">(hover a figure for the other units)</span>
      </div>
      <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_minmax(320px,28%)]">
        <BoardTable rows={ranked} units={units} lossUnits={lossUnits} selectedId={selectedId} onSelect={(r) => setSelectedId(r.fieldId)} showFarm={showFarm} />
        <div className="flex flex-col gap-2 xl:sticky xl:top-2 xl:self-start">
          <div className="flex min-h-12 flex-wrap items-center gap-2 rounded-md border border-paper-edge bg-white/50 px-3 py-2 text-sm" data-testid="board-selection" aria-live="polite">
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
          <div className="h-[420px] overflow-hidden rounded-md border border-paper-edge">
            <BoardMap fields={fields} rows={rows} selectedId={selectedId} onSelect={onMapSelect} tileUrl={tileUrl} tileAttribution={tileAttribution} />
          </div>
          <RiskLegend counts={counts} />
        </div>
      </div>
      <div className="max-w-4xl">
        <AVsTChart rows={rows} units={lossUnits} showFarm={showFarm} />
      </div>
    </div>
  );
}
