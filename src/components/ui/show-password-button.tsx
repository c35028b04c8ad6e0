import type { ReactNode } from 'react';
import { Button } from './button';

/** "Show password": a toggle (aria-pressed) that the password fields read as their `type`. */
export function ShowPasswordButton({ shown, onToggle, children }: { shown: boolean; onToggle: () => void; children: ReactNode }) {
  return (
    <Button variant="quiet" className="-ml-3 px-3" aria-pressed={shown} onClick={onToggle}>
      {children}
    </Button>
  );
}
