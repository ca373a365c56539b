// Under each field of the board, in words: why it ranks where it does, and what its estimate
// still waits for. The table puts it under each row, the phone's cards at the foot of each card.
import type { BoardRow } from '../../../../shared/schemas/assessment';

/** Under each row, in words: why it ranks where it does, and what its estimate still waits for. */
export function BoardReasons({ row }: { row: BoardRow }) {
  return (
    <p className="flex flex-wrap gap-x-3 gap-y-0.5 text-ink-soft">
      <span>
        <span className="font-semibold text-ink">Why: </span>
        {row.reasons.length ? row.reasons.join(' · ') : row.riskClass ? 'no strong driver' : 'not ranked until the missing inputs are in'}
      </span>
      {row.gaps.length ? (
        <span className="text-caution">
          <span className="font-semibold">Missing: </span>
          {row.gaps.map((g) => g.message).join(' · ')}
        </span>
      ) : null}
    </p>
  );
}
