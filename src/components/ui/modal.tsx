import { useEffect, useId, useRef, type KeyboardEvent, type ReactNode } from 'react';
import { focusables, keepTabInside } from '@/lib/focus-trap';

interface ModalProps {
  title: string;
  children: ReactNode;
  /** Escape does this; leave it out when the person must choose (no way to dismiss without a choice). */
  onEscape?: () => void;
}

/**
 * A modal over the page: focus moves to its first control and stays inside (Tab wraps), and goes
 * back to where it was when the modal closes. The page under it stays mounted, so nothing typed there is lost.
 */
export function Modal({ title, children, onEscape }: ModalProps) {
  const titleId = useId();
  const boxRef = useRef<HTMLDivElement | null>(null);

  useEffect(() => {
    const opener = document.activeElement as HTMLElement | null;
    focusables(boxRef.current)[0]?.focus();
    return () => opener?.focus();
  }, []);

  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key === 'Escape' && onEscape) onEscape();
    keepTabInside(event, boxRef.current);
  };

  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center overflow-y-auto bg-ink/70 p-4" onKeyDown={onKeyDown}>
      <div ref={boxRef} role="dialog" aria-modal="true" aria-labelledby={titleId} className="my-auto w-full max-w-2xl space-y-5 rounded-xl border-4 border-ink bg-surface-raised p-6 shadow-xl">
        <h2 id={titleId} className="text-2xl font-bold text-ink">
          {title}
        </h2>
        {children}
      </div>
    </div>
  );
}
