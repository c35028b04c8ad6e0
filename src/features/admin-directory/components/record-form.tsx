import type { ReactNode } from 'react';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/api-error';

interface RecordFormProps {
  title: string;
  onSubmit: () => void;
  onCancel: () => void;
  busy: boolean;
  error: unknown;
  children: ReactNode;
}

/** The frame every directory form shares: heading, server error, fields, save and cancel. */
export function RecordForm({ title, onSubmit, onCancel, busy, error, children }: RecordFormProps) {
  return (
    <form
      noValidate
      aria-label={title}
      className="space-y-4 rounded-lg border-2 border-accent bg-surface-raised p-4"
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit();
      }}
    >
      <h2 className="text-2xl font-semibold text-ink">{title}</h2>
      {error != null && (
        <Banner tone="error" role="alert" title="Not saved">
          {errorMessage(error)}
        </Banner>
      )}
      {children}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" disabled={busy}>
          {busy ? 'Saving…' : 'Save'}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
