// A message box beside what it is about. Tone is always spelled out in words too.
import type { ReactNode } from 'react';

type Tone = 'error' | 'caution' | 'info';

const TONES: Record<Tone, string> = {
  error: 'border-alert bg-alert-light text-alert',
  caution: 'border-caution bg-caution-light text-caution',
  info: 'border-ink-faint bg-paper-deep text-ink',
};

export function Notice({
  tone = 'info',
  title,
  children,
  className = '',
  testId,
}: {
  tone?: Tone;
  title?: string;
  children?: ReactNode;
  className?: string;
  testId?: string;
}) {
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      data-testid={testId}
      className={`rounded-md border px-3 py-2 text-sm ${TONES[tone]} ${className}`}
    >
      {title ? <p className="font-semibold">{title}</p> : null}
      {children}
    </div>
  );
}
