// A modal dialog over a dimmed page: focus moves into it and stays there (Tab wraps around, as
// WAI-ARIA's dialog pattern asks), Escape or a click outside closes it, and focus goes back to
// what had it before.
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
  const latestClose = useRef(onClose);
  latestClose.current = onClose;
  useEffect(() => {
    const before = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    ref.current?.focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') latestClose.current();
      else if (e.key === 'Tab' && ref.current) keepFocusInside(ref.current, e);
    };
    window.addEventListener('keydown', onKey);
    return () => {
      window.removeEventListener('keydown', onKey);
      if (before?.isConnected) before.focus();
    };
  }, []);
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

const FOCUSABLE = 'a[href], button:not([disabled]), input:not([disabled]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

/** Tab from the last control goes to the first, Shift+Tab from the first to the last. */
function keepFocusInside(panel: HTMLElement, e: KeyboardEvent): void {
  const items = [...panel.querySelectorAll<HTMLElement>(FOCUSABLE)].filter((el) => el.offsetParent !== null);
  if (items.length === 0) {
    e.preventDefault();
    return;
  }
  const first = items[0];
  const last = items[items.length - 1];
  const active = document.activeElement;
  if (e.shiftKey && (active === first || active === panel)) {
    e.preventDefault();
    last.focus();
  } else if (!e.shiftKey && (active === last || !panel.contains(active))) {
    e.preventDefault();
    first.focus();
  }
}
