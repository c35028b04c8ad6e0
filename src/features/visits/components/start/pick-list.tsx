import type { ReactNode } from 'react';

interface ChoiceButtonsProps<T extends { id: number }> {
  items: T[];
  label: string;
  onPick: (item: T) => void;
  /** What the button says; the whole button is the target. */
  children: (item: T) => ReactNode;
}

/** Search results as big buttons, one per row: tap the one you mean. */
export function ChoiceButtons<T extends { id: number }>({ items, label, onPick, children }: ChoiceButtonsProps<T>) {
  return (
    <ul aria-label={label} className="space-y-2">
      {items.map((item) => (
        <li key={item.id}>
          <button
            type="button"
            onClick={() => onPick(item)}
            className="block min-h-touch w-full rounded-lg border-2 border-surface-line bg-surface-raised px-4 py-3 text-left text-ink hover:border-accent focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent"
          >
            {children(item)}
          </button>
        </li>
      ))}
    </ul>
  );
}

/** A short list of search results (customers or sites) to tap. */
export function PickList<T extends { id: number; name: string }>({ items, label, onPick, describe }: { items: T[]; label: string; onPick: (item: T) => void; describe?: (item: T) => string | null }) {
  return (
    <ChoiceButtons items={items} label={label} onPick={onPick}>
      {(item) => (
        <>
          <span className="text-lg font-semibold">{item.name}</span>
          {describe?.(item) && <span className="block text-base font-normal text-ink-muted">{describe(item)}</span>}
        </>
      )}
    </ChoiceButtons>
  );
}
