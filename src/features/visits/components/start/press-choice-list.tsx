import { formatCapacity } from '@shared/format/capacity';
import type { Press } from '@shared/schemas/press';

/** Search results as big buttons: tap the press you are standing at. */
export function PressChoiceList({ presses, onChoose, label }: { presses: Press[]; onChoose: (press: Press) => void; label: string }) {
  return (
    <ul aria-label={label} className="space-y-2">
      {presses.map((p) => (
        <li key={p.id}>
          <button
            type="button"
            onClick={() => onChoose(p)}
            className="block min-h-touch w-full rounded-lg border-2 border-surface-line bg-surface-raised px-4 py-3 text-left hover:border-accent focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent"
          >
            <span className="block text-xl font-bold text-ink">{p.assetTag}</span>
            <span className="block text-base text-ink-muted">
              {p.model} · {formatCapacity(p.tonnage, p.capacityUnit)}{p.customerName ? ` · ${p.customerName}` : ''}
              {p.siteName ? ` · ${p.siteName}` : ''}
            </span>
          </button>
        </li>
      ))}
    </ul>
  );
}
