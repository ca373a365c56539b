// The priority board as a table (TanStack Table): rank from the server's order, every figure
// with its unit, sortable by any column, filtered by name, risk class, problem clay and gaps.
// Clicking a row picks the field on the map; its name opens the Field screen. On a phone the
// rows are cards (board-cards.tsx) with an order picker in place of the column headers.
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type FilterFn,
  type SortingState,
} from '@tanstack/react-table';
import { RISK_CLASSES } from '../../../../shared/erosion/risk-class';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import type { Units } from '../../../../shared/schemas/auth';
import { paths } from '../../../lib/paths';
import { formatArea } from '../../../lib/units';
import { formatFigure } from '../../../lib/format-figure';
import { lossFigure, runoffFigure, tonnesFigure, type Figure } from '../../../lib/loss-units';
import { RiskBadge } from '../../../components/risk/risk-badge';
import { useNarrowScreen } from '../../../lib/use-narrow-screen';
import { BoardCards } from './board-cards';
import { BoardReasons } from './board-reasons';
import { HIDDEN_IN_TREATMENTS_VIEW, treatmentColumns, type BoardTreatments } from './treatment-columns';

export type RankedRow = BoardRow & { rank: number };

const col = createColumnHelper<RankedRow>();

/** The figure in the chosen units; the other units on hover. The column header names the unit. */
function FigureCell({ figure, testId }: { figure: Figure | null; testId?: string }) {
  if (!figure) return <span className="text-ink-faint">—</span>;
  return (
    <span className="num block whitespace-nowrap text-right" data-testid={testId} title={figure.alt}>
      {figure.main}
    </span>
  );
}

/** The phone's order picker: the board's own ranking, or one column. */
const ORDERS = [
  { value: '', label: 'Rank (A/T, then soil lost)' },
  { value: 'aOverT:desc', label: 'A/T, highest first' },
  { value: 'soilLoss:desc', label: 'Soil loss A, highest first' },
  { value: 'tonnes:desc', label: 'Soil lost a year, most first' },
  { value: 'runoff:desc', label: 'Storm runoff, most first' },
  { value: 'field:asc', label: 'Field name, A to Z' },
];

const riskFilter: FilterFn<RankedRow> = (row, _id, value: string) =>
  !value || (value === 'not-assessed' ? row.original.riskClass === null : row.original.riskClass?.key === value);
const trueOnly: FilterFn<RankedRow> = (row, id, value: boolean) => !value || Boolean(row.getValue(id));

type Props = {
  rows: RankedRow[];
  /** Area units, from the user's setting. */
  units: Units;
  /** Soil loss, tonnes and runoff: SI ('ha') or US ('ac'), the board's own toggle. */
  lossUnits: Units;
  selectedId: number | null;
  onSelect: (row: RankedRow) => void;
  /** Show the farm of each row (the advisor's board across client farms). */
  showFarm?: boolean;
  /** The treatments view: each field's best option and its cost, in place of area, T, tonnes, runoff, clay and gaps. */
  treatments?: BoardTreatments | null;
};

export function BoardTable({ rows, units, lossUnits, selectedId, onSelect, showFarm = false, treatments = null }: Props) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [globalFilter, setGlobalFilter] = useState('');

  const columns = useMemo(
    () => [
      col.accessor('rank', {
        header: 'Rank',
        cell: (c) => <span className="num block text-right font-semibold">{c.getValue()}</span>,
      }),
      col.accessor((r) => (showFarm && r.farmName ? `${r.name} ${r.farmName}` : r.name), {
        id: 'field',
        header: 'Field',
        sortingFn: (a, b) => a.original.name.localeCompare(b.original.name),
        cell: (c) => (
          <span className="flex flex-col">
            <Link
              to={paths.field.getHref(c.row.original.farmId, c.row.original.fieldId)}
              className="whitespace-nowrap font-semibold text-clay-dark underline-offset-2 hover:underline"
              data-testid="board-field-link"
              onClick={(e) => e.stopPropagation()}
            >
              {c.row.original.name}
            </Link>
            {showFarm && c.row.original.farmName ? <span className="text-xs text-ink-soft">{c.row.original.farmName}</span> : null}
          </span>
        ),
      }),
      col.accessor('areaHa', {
        header: `Area (${units})`,
        cell: (c) => <span className="num block whitespace-nowrap text-right">{formatArea(c.getValue(), units)}</span>,
      }),
      col.accessor((r) => r.soilLossTPerHaYr ?? undefined, {
        id: 'soilLoss',
        header: lossUnits === 'ac' ? 'A (US t/ac/yr)' : 'A (t/ha/yr)',
        sortUndefined: 'last',
        cell: (c) => {
          const v = c.row.original.soilLossTPerHaYr;
          return <FigureCell figure={v === null ? null : lossFigure(v, lossUnits)} testId="board-a" />;
        },
      }),
      col.accessor((r) => r.toleranceTPerHaYr ?? undefined, {
        id: 'tolerance',
        header: lossUnits === 'ac' ? 'T (US t/ac/yr)' : 'T (t/ha/yr)',
        sortUndefined: 'last',
        cell: (c) => {
          const v = c.row.original.toleranceTPerHaYr;
          return <FigureCell figure={v === null ? null : lossFigure(v, lossUnits)} />;
        },
      }),
      col.accessor((r) => r.aOverT ?? undefined, {
        id: 'aOverT',
        header: 'A/T',
        sortUndefined: 'last',
        cell: (c) => {
          const v = c.row.original.aOverT;
          return v === null ? (
            <span className="text-ink-faint">—</span>
          ) : (
            <span className="num block text-right font-semibold" data-testid="board-a-over-t">
              {formatFigure(v)}
            </span>
          );
        },
      }),
      col.accessor((r) => r.tonnesPerYr ?? undefined, {
        id: 'tonnes',
        header: lossUnits === 'ac' ? 'Soil lost (US tons/yr)' : 'Soil lost (t/yr)',
        sortUndefined: 'last',
        cell: (c) => {
          const v = c.row.original.tonnesPerYr;
          return <FigureCell figure={v === null ? null : tonnesFigure(v, lossUnits)} testId="board-tonnes" />;
        },
      }),
      col.accessor((r) => r.runoffMm ?? undefined, {
        id: 'runoff',
        header: lossUnits === 'ac' ? 'Storm runoff (in)' : 'Storm runoff (mm)',
        sortUndefined: 'last',
        cell: (c) => {
          const v = c.row.original.runoffMm;
          return <FigureCell figure={v === null ? null : runoffFigure(v, lossUnits)} />;
        },
      }),
      col.accessor((r) => (r.riskClass ? RISK_CLASSES.findIndex((k) => k.key === r.riskClass!.key) : undefined), {
        id: 'risk',
        header: 'Risk class',
        sortUndefined: 'last',
        filterFn: riskFilter,
        cell: (c) => <RiskBadge riskClass={c.row.original.riskClass} />,
      }),
      col.accessor('problemClay', {
        header: 'Problem clay',
        filterFn: trueOnly,
        cell: (c) =>
          c.getValue() ? (
            <span className="whitespace-nowrap rounded border border-caution bg-caution-light px-1.5 py-0.5 text-xs font-semibold text-caution" data-testid="board-problem-clay">
              yes
            </span>
          ) : (
            <span className="text-xs text-ink-soft">no</span>
          ),
      }),
      col.accessor((r) => r.gaps.length, {
        id: 'gaps',
        header: 'What is missing',
        filterFn: trueOnly,
        cell: (c) => {
          const n = c.getValue();
          return n ? (
            <span className="whitespace-nowrap text-xs font-semibold text-caution">
              <span className="num">{n}</span> missing
            </span>
          ) : (
            <span className="text-xs text-ink-soft">none</span>
          );
        },
      }),
      ...(treatments ? treatmentColumns(treatments, lossUnits) : []),
    ],
    [units, lossUnits, showFarm, treatments],
  );
  const columnVisibility = useMemo(
    () => Object.fromEntries(HIDDEN_IN_TREATMENTS_VIEW.map((id) => [id, !treatments])),
    [treatments],
  );

  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, columnFilters, globalFilter, columnVisibility },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onGlobalFilterChange: setGlobalFilter,
    globalFilterFn: (row, _id, value: string) => {
      const q = value.trim().toLowerCase();
      return !q || `${row.original.name} ${row.original.farmName ?? ''}`.toLowerCase().includes(q);
    },
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const riskValue = (table.getColumn('risk')?.getFilterValue() as string | undefined) ?? '';
  const clayOnly = Boolean(table.getColumn('problemClay')?.getFilterValue());
  const gapsOnly = Boolean(table.getColumn('gaps')?.getFilterValue());
  const shown = table.getRowModel().rows;
  const columnCount = table.getVisibleLeafColumns().length;
  const narrow = useNarrowScreen();
  const order = sorting[0] ? `${sorting[0].id}:${sorting[0].desc ? 'desc' : 'asc'}` : '';

  return (
    <div className="flex min-w-0 flex-col gap-2">
      <div className="flex flex-wrap items-end gap-3 text-sm" role="group" aria-label="Filter the board">
        <label className="flex flex-col gap-1 font-medium">
          Find a field
          <input
            type="search"
            value={globalFilter}
            onChange={(e) => setGlobalFilter(e.target.value)}
            placeholder={showFarm ? 'Field or farm name' : 'Field name'}
            className="w-44 rounded-md border border-ink-faint bg-white/70 px-2 py-1 text-base"
            data-testid="board-filter-name"
          />
        </label>
        <label className="flex flex-col gap-1 font-medium">
          Risk class
          <select
            value={riskValue}
            onChange={(e) => table.getColumn('risk')?.setFilterValue(e.target.value || undefined)}
            className="rounded-md border border-ink-faint bg-white/70 px-2 py-1 text-base"
            data-testid="board-filter-risk"
          >
            <option value="">Every class</option>
            {RISK_CLASSES.map((c) => (
              <option key={c.key} value={c.key}>
                {c.label}
              </option>
            ))}
            <option value="not-assessed">Not assessed</option>
          </select>
        </label>
        <label className="flex items-center gap-1.5 pb-1">
          <input
            type="checkbox"
            checked={clayOnly}
            onChange={(e) => table.getColumn('problemClay')?.setFilterValue(e.target.checked || undefined)}
            data-testid="board-filter-clay"
          />
          Problem clay only
        </label>
        <label className="flex items-center gap-1.5 pb-1">
          <input
            type="checkbox"
            checked={gapsOnly}
            onChange={(e) => table.getColumn('gaps')?.setFilterValue(e.target.checked || undefined)}
            data-testid="board-filter-gaps"
          />
          Missing inputs only
        </label>
        {narrow ? (
          <label className="flex flex-col gap-1 font-medium">
            Order
            <select
              value={order}
              onChange={(e) => {
                const [id, dir] = e.target.value.split(':');
                setSorting(id ? [{ id, desc: dir === 'desc' }] : []);
              }}
              className="rounded-md border border-ink-faint bg-white/70 px-2 py-1 text-base"
              data-testid="board-order"
            >
              {ORDERS.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </select>
          </label>
        ) : null}
        <p className="num pb-1 text-ink-soft" aria-live="polite">
          {shown.length} of {rows.length} fields
        </p>
      </div>
      {narrow ? (
        <BoardCards rows={shown} selectedId={selectedId} onSelect={onSelect} />
      ) : (
        <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/40">
          <table className="w-full border-collapse text-left text-sm" data-testid="board-table">
            <caption className="sr-only">Fields ranked by A/T, then soil lost a year</caption>
            <thead>
              {table.getHeaderGroups().map((hg) => (
                <tr key={hg.id} className="border-b border-ink-faint bg-paper-deep/60 text-ink-soft">
                  {hg.headers.map((h) => {
                    const sorted = h.column.getIsSorted();
                    return (
                      <th
                        key={h.id}
                        scope="col"
                        className="px-1.5 py-1.5 align-bottom font-medium"
                        aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                      >
                        {h.column.getCanSort() ? (
                          <button
                            type="button"
                            onClick={h.column.getToggleSortingHandler()}
                            className="inline-flex items-center gap-1 text-left font-medium hover:text-ink"
                            data-testid={`board-sort-${h.column.id}`}
                            title="Sort by this column"
                          >
                            {flexRender(h.column.columnDef.header, h.getContext())}
                            <span aria-hidden="true" className="text-xs">
                              {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                            </span>
                          </button>
                        ) : (
                          flexRender(h.column.columnDef.header, h.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {shown.map((row) => {
                const selected = row.original.fieldId === selectedId;
                const main = (
                  <tr
                    key={row.id}
                    data-testid="board-row"
                    data-field-id={row.original.fieldId}
                    aria-selected={selected}
                    tabIndex={0}
                    onClick={() => onSelect(row.original)}
                    onKeyDown={(e) => {
                      if (e.key === 'Enter' || e.key === ' ') {
                        e.preventDefault();
                        onSelect(row.original);
                      }
                    }}
                    className={`cursor-pointer align-top ${
                      selected ? 'bg-clay-light' : 'hover:bg-paper-deep/60'
                    }`}
                  >
                    {row.getVisibleCells().map((cell) => (
                      <td key={cell.id} className="px-1.5 pt-1.5">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ))}
                  </tr>
                );
                const why = (
                  <tr
                    key={`${row.id}-why`}
                    onClick={() => onSelect(row.original)}
                    className={`cursor-pointer border-b border-paper-edge ${selected ? 'bg-clay-light' : ''}`}
                    data-testid="board-row-reasons"
                  >
                    <td />
                    <td colSpan={columnCount - 1} className="px-1.5 pb-1.5 pt-0.5 text-xs">
                      <BoardReasons row={row.original} />
                    </td>
                  </tr>
                );
                return [main, why];
              })}
              {shown.length === 0 ? (
                <tr>
                  <td colSpan={columnCount} className="px-2 py-4 text-center text-ink-soft">
                    No field matches these filters.
                  </td>
                </tr>
              ) : null}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
