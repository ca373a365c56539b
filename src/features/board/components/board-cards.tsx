// The priority board on a phone: one card per field in the table's order and filters, with the
// rank, the risk class in words, A/T, and every other column of the table as a labelled line,
// so nothing runs off a narrow screen. Tapping a card picks the field on the map.
import { flexRender, type Row } from '@tanstack/react-table';
import type { RankedRow } from './board-table';
import { BoardReasons } from './board-reasons';

/** Shown in the card's heading, not as lines. */
const IN_HEADING = new Set(['rank', 'field', 'risk']);

export function BoardCards({ rows, selectedId, onSelect }: { rows: Row<RankedRow>[]; selectedId: number | null; onSelect: (row: RankedRow) => void }) {
  if (rows.length === 0) return <p className="rounded-md border border-paper-edge px-2 py-4 text-center text-ink-soft">No field matches these filters.</p>;
  return (
    <ol className="flex flex-col gap-2" data-testid="board-cards" aria-label="Fields ranked by A/T, then soil lost a year">
      {rows.map((row) => {
        const r = row.original;
        const selected = r.fieldId === selectedId;
        const cells = row.getVisibleCells();
        const cell = (id: string) => cells.find((c) => c.column.id === id);
        const pick = () => onSelect(r);
        return (
          <li
            key={row.id}
            data-testid="board-card"
            data-field-id={r.fieldId}
            aria-selected={selected}
            tabIndex={0}
            onClick={pick}
            onKeyDown={(e) => {
              if (e.key === 'Enter' || e.key === ' ') {
                e.preventDefault();
                pick();
              }
            }}
            className={`flex cursor-pointer flex-col gap-2 rounded-md border p-3 ${selected ? 'border-clay bg-clay-light' : 'border-paper-edge bg-white/40'}`}
          >
            <div className="flex items-start justify-between gap-2">
              <span className="flex items-baseline gap-2">
                <span className="num text-lg font-semibold" aria-label={`Rank ${r.rank}`}>
                  {r.rank}.
                </span>
                {flexRender(cell('field')!.column.columnDef.cell, cell('field')!.getContext())}
              </span>
              {flexRender(cell('risk')!.column.columnDef.cell, cell('risk')!.getContext())}
            </div>
            <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
              {cells
                .filter((c) => !IN_HEADING.has(c.column.id))
                .map((c) => (
                  <div key={c.id} className="contents">
                    <dt className="text-ink-soft">{typeof c.column.columnDef.header === 'string' ? c.column.columnDef.header : c.column.id}</dt>
                    <dd className="min-w-0 justify-self-end text-right [&_*]:text-right">{flexRender(c.column.columnDef.cell, c.getContext())}</dd>
                  </div>
                ))}
            </dl>
            <div className="text-xs">
              <BoardReasons row={r} />
            </div>
          </li>
        );
      })}
    </ol>
  );
}
