import { formatCapacity } from '@shared/format/capacity';
import { FieldError } from '@/components/ui/field-error';
import type { Press } from '@shared/schemas/press';
import { Button } from '@/components/ui/button';
import { AssetTagSearch } from './asset-tag-search';
import { BrowsePressSearch } from './browse-press-search';

interface PressPickerProps {
  press: Press | null;
  onChange: (press: Press | null) => void;
  error?: string;
  errorId: string;
}

/** Which press: by asset tag first (what the technician at the machine can read), or customer → site → press. */
export function PressPicker({ press, onChange, error, errorId }: PressPickerProps) {
  return (
    <section aria-labelledby="press-picker-heading" aria-describedby={error ? errorId : undefined} className="space-y-4">
      <h2 id="press-picker-heading" className="text-2xl font-bold text-ink">
        Press
      </h2>
      {press ? (
        <div className="space-y-3 rounded-lg border-2 border-accent bg-accent-soft p-4">
          <p className="text-xl font-bold text-ink">{press.assetTag}</p>
          <p className="text-lg text-ink">
            {press.model} · {formatCapacity(press.tonnage, press.capacityUnit)}
          </p>
          <p className="text-lg text-ink-muted">{[press.customerName, press.siteName].filter(Boolean).join(' · ')}</p>
          <p className="text-lg text-ink-muted">Sensor generation on record: {press.sensorGeneration ?? 'not recorded'}</p>
          <Button variant="secondary" onClick={() => onChange(null)}>
            Choose another press
          </Button>
        </div>
      ) : (
        <>
          <AssetTagSearch onChoose={onChange} />
          <details className="rounded-lg border border-surface-line bg-surface-raised p-4">
            <summary className="flex min-h-touch cursor-pointer items-center text-lg font-semibold text-ink">No tag to hand? Find it by customer and site</summary>
            <div className="mt-3">
              <BrowsePressSearch onChoose={onChange} />
            </div>
          </details>
        </>
      )}
      <FieldError id={errorId} message={error} />
    </section>
  );
}
