// Saves the board as the screen shows it as a CSV file, made in the browser from the rows on
// screen: "<farm>-<season>-board.csv". The CSV writer loads on the first click, not with the board.
import { Button } from '../../../components/ui/button';
import { saveFile } from '../../../lib/save-file';
import { exportFileName } from '../../../../shared/exports/file-names';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import type { Units } from '../../../../shared/schemas/auth';

/** `fileStem` names the file: the farm's name, or the advisor's "client farms". */
type Props = { rows: BoardRow[]; units: Units; lossUnits: Units; showFarm: boolean; season: string | null; fileStem: string };

export function BoardCsvButton({ rows, units, lossUnits, showFarm, season, fileStem }: Props) {
  const save = async () => {
    const { boardCsv } = await import('./board-csv');
    const blob = new Blob([boardCsv(rows, units, lossUnits, showFarm)], { type: 'text/csv;charset=utf-8' });
    saveFile(blob, exportFileName(fileStem, season ?? 'newest-seasons', 'board', 'csv'));
  };
  return (
    <Button variant="secondary" size="sm" onClick={() => void save()} className="print:hidden" data-testid="board-csv">
      Save the board as CSV
    </Button>
  );
}
