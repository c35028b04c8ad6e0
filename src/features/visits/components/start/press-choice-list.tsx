import { formatCapacity } from '@shared/format/capacity';
import type { Press } from '@shared/schemas/press';
import { ChoiceButtons } from './pick-list';

/** Search results as big buttons: tap the press you are standing at. */
export function PressChoiceList({ presses, onChoose, label }: { presses: Press[]; onChoose: (press: Press) => void; label: string }) {
  return (
    <ChoiceButtons items={presses} label={label} onPick={onChoose}>
      {(p) => (
        <>
          <span className="block text-xl font-bold text-ink">{p.assetTag}</span>
          <span className="block text-base text-ink-muted">
            {p.model} · {formatCapacity(p.tonnage, p.capacityUnit)}{p.customerName ? ` · ${p.customerName}` : ''}
            {p.siteName ? ` · ${p.siteName}` : ''}
          </span>
        </>
      )}
    </ChoiceButtons>
  );
}
