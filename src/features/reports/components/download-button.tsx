// A button that fetches a file the server makes and saves it, showing what is happening: a
// moving bar and the seconds so far while the server makes it, then the share received.
import { useEffect, useRef, useState } from 'react';
import { Button, type ButtonProps } from '../../../components/ui/button';
import { saveFile } from '../../../lib/save-file';
import { downloadFile, type DownloadProgress } from '../api/download-file';

type Props = {
  url: string;
  label: string;
  /** What the server is making, for the progress line ("the report"). */
  making: string;
  testId?: string;
  variant?: ButtonProps['variant'];
};

export function DownloadButton({ url, label, making, testId, variant = 'secondary' }: Props) {
  const [progress, setProgress] = useState<DownloadProgress | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [seconds, setSeconds] = useState(0);
  const alive = useRef(true);
  useEffect(() => () => void (alive.current = false), []);
  useEffect(() => {
    if (progress?.phase !== 'making') return;
    setSeconds(0);
    const t = setInterval(() => setSeconds((s) => s + 1), 1000);
    return () => clearInterval(t);
  }, [progress?.phase]);

  async function run() {
    setError(null);
    try {
      const file = await downloadFile(url, (p) => alive.current && setProgress(p));
      saveFile(file.blob, file.fileName);
    } catch (e) {
      if (alive.current) setError(e instanceof Error ? e.message : String(e));
    } finally {
      if (alive.current) setProgress(null);
    }
  }

  const busy = progress !== null;
  const fraction = progress?.phase === 'receiving' ? progress.fraction : null;
  return (
    <div className="flex flex-col gap-1 print:hidden" data-testid={testId}>
      <Button variant={variant} size="sm" onClick={run} disabled={busy} aria-busy={busy}>
        {label}
      </Button>
      {busy ? (
        <div role="status" className="flex items-center gap-2 text-xs text-ink-soft" data-testid={testId ? `${testId}-progress` : undefined}>
          {/* No value while the server works: the browser shows a moving bar. */}
          <progress className="h-1.5 w-24 accent-clay" max={1} {...(fraction !== null ? { value: fraction } : {})} />
          <span>
            {progress.phase === 'making'
              ? `Making ${making}…${seconds ? ` ${seconds} s` : ''}`
              : fraction !== null
                ? `Receiving ${Math.round(fraction * 100)} %`
                : 'Receiving…'}
          </span>
        </div>
      ) : null}
      {error ? (
        <p role="alert" className="text-xs text-alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}
