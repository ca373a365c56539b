// A modal dialog over a dimmed page: focus moves into it, Escape or a click outside closes it.
import { useEffect, useRef, type ReactNode } from 'react';

export function ModalDialog({
  titleId,
  onClose,
  testId,
  className,
  backdrop = 'bg-ink/40',
  children,
}: {
  /** Id of the dialog's heading, for aria-labelledby. */
  titleId: string;
  onClose: () => void;
  testId?: string;
  /** Size and layout of the panel. */
  className: string;
  backdrop?: string;
  children: ReactNode;
}) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    ref.current?.focus();
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && onClose();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);
  return (
    <div className={`fixed inset-0 z-[2000] flex items-center justify-center p-4 ${backdrop}`} onClick={onClose}>
      <div
        ref={ref}
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        tabIndex={-1}
        data-testid={testId}
        className={`rounded-lg border border-paper-edge bg-paper shadow-xl ${className}`}
        onClick={(e) => e.stopPropagation()}
      >
        {children}
      </div>
    </div>
  );
}
