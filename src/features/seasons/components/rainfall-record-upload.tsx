// R from the farm's own rainfall record: a CSV of breakpoints (time, and cumulative_mm or
// depth_mm). The server splits and screens the storms by the RUSLE rules and sums EI30.
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import type { Climate } from '../../../../shared/schemas/season';
import { formatFigure } from '../../../lib/format-figure';
import { useUploadRainfallRecord } from '../api/upload-rainfall-record';

export function RainfallRecordUpload({ farmId, climate }: { farmId: number; climate: Climate | null }) {
  const upload = useUploadRainfallRecord(farmId);
  const [file, setFile] = useState<File | null>(null);
  const [storm, setStorm] = useState('');
  const inputId = useId();
  const needsStorm = climate === null;
  const stormMm = storm.trim() === '' ? undefined : Number(storm);
  const stormBad = needsStorm && (stormMm === undefined || !Number.isFinite(stormMm) || stormMm < 1);

  return (
    <div className="flex flex-col gap-2 border-t border-paper-edge pt-3" data-testid="rainfall-record">
      <label htmlFor={inputId} className="text-sm font-semibold">
        Or work R out from a rainfall record (CSV)
      </label>
      <p className="text-xs text-ink-soft">
        One row per breakpoint: <code>time</code> (e.g. 2026-06-03T14:30) and <code>cumulative_mm</code> (rain since the start) or{' '}
        <code>depth_mm</code> (rain since the row before). Several years give a steadier R.
      </p>
      <input id={inputId} type="file" accept=".csv,text/csv" data-testid="rainfall-record-input" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
      {needsStorm ? (
        <label className="flex flex-col gap-1 text-sm">
          Design storm rainfall (mm)
          <input className="num w-32 rounded border border-paper-edge bg-white px-2 py-1" inputMode="decimal" value={storm} onChange={(e) => setStorm(e.target.value)} data-testid="rainfall-record-storm" />
        </label>
      ) : null}
      <Button
        type="button"
        size="sm"
        className="self-start"
        disabled={!file || stormBad || upload.isPending}
        onClick={() => file && upload.mutate({ file, designStormMm: stormMm })}
        data-testid="rainfall-record-upload"
      >
        {upload.isPending ? 'Working out R…' : 'Work out R from the record'}
      </Button>
      {upload.isError ? (
        <Notice tone="error" testId="rainfall-record-error">
          {upload.error.message}
        </Notice>
      ) : null}
      {upload.isSuccess && upload.data.record ? (
        <p role="status" className="text-sm" data-testid="rainfall-record-result">
          R = <span className="num font-semibold">{formatFigure(upload.data.record.r)}</span> MJ·mm/(ha·h·yr) from {upload.data.record.years} year
          {upload.data.record.years === 1 ? '' : 's'} of record, {upload.data.record.erosiveStorms} erosive storm{upload.data.record.erosiveStorms === 1 ? '' : 's'}.
        </p>
      ) : null}
    </div>
  );
}
