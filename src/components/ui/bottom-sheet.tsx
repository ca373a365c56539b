// A panel that sits at the foot of a full-screen map on a phone: a bar with what it holds,
// which opens the panel over the lower part of the map and closes it again (tap, Enter or
// Space on the bar; Escape inside the panel closes it and gives focus back to the bar).
import { useId, useRef, type ReactNode } from 'react';

type Props = {
  /** The panel's accessible name. */
  label: string;
  /** What the bar says (e.g. "Fields (6)"). */
  summary: ReactNode;
  open: boolean;
  onOpenChange: (open: boolean) => void;
  children: ReactNode;
  testId?: string;
};

export function BottomSheet({ label, summary, open, onOpenChange, children, testId }: Props) {
  const bodyId = useId();
  const bar = useRef<HTMLButtonElement>(null);
  return (
    <section
      aria-label={label}
      data-testid={testId}
      data-open={open}
      className="absolute inset-x-0 bottom-0 z-[1100] flex max-h-[75%] flex-col rounded-t-xl border-t border-paper-edge bg-paper shadow-[0_-4px_16px_rgba(31,27,22,0.18)]"
      onKeyDown={(e) => {
        if (e.key === 'Escape' && open) {
          e.stopPropagation();
          onOpenChange(false);
          bar.current?.focus();
        }
      }}
    >
      <button
        ref={bar}
        type="button"
        aria-expanded={open}
        aria-controls={bodyId}
        onClick={() => onOpenChange(!open)}
        data-testid={testId ? `${testId}-bar` : undefined}
        className="flex min-h-12 w-full shrink-0 flex-col items-center gap-1 px-4 pb-2 pt-1.5 text-left"
      >
        <span aria-hidden="true" className="h-1 w-10 rounded-full bg-ink-faint" />
        <span className="flex w-full items-center justify-between gap-2 font-medium">
          <span className="min-w-0 truncate">{summary}</span>
          <span className="shrink-0 text-sm text-clay-dark">{open ? 'Close ▾' : 'Open ▴'}</span>
        </span>
      </button>
      <div id={bodyId} hidden={!open} className="min-h-0 flex-1 overflow-y-auto overscroll-contain border-t border-paper-edge">
        {children}
      </div>
    </section>
  );
}
