import { useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';

interface ConfirmButtonProps {
  label: string;
  /** What will happen, said before the second tap. */
  consequence: ReactNode;
  confirmLabel: string;
  onConfirm: () => void;
  busy?: boolean;
  variant?: 'primary' | 'secondary';
}

/** Two taps for a step that cannot be undone, so a gloved mis-tap does nothing. */
export function ConfirmButton({ label, consequence, confirmLabel, onConfirm, busy, variant = 'primary' }: ConfirmButtonProps) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button variant={variant} onClick={() => setAsking(true)} disabled={busy}>
        {label}
      </Button>
    );
  }
  return (
    <div role="group" aria-label={label} className="space-y-3 rounded-lg border-2 border-surface-edge bg-surface-raised p-4">
      <p className="text-lg text-ink">{consequence}</p>
      <div className="flex flex-wrap gap-3">
        <Button
          variant={variant}
          disabled={busy}
          onClick={() => {
            onConfirm();
            setAsking(false);
          }}
        >
          {confirmLabel}
        </Button>
        <Button variant="secondary" onClick={() => setAsking(false)}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
