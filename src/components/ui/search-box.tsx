import { useEffect, useId, useState, type FormEvent } from 'react';
import { Button } from './button';
import { TextInput } from './text-input';

interface SearchBoxProps {
  label: string;
  hint?: string;
  /** The search currently applied (usually from the URL). */
  value: string;
  onSearch: (text: string) => void;
  delayMs?: number;
}

/** A search field that applies what was typed after a short pause, or at once on Enter. */
export function SearchBox({ label, hint, value, onSearch, delayMs = 350 }: SearchBoxProps) {
  const id = useId();
  const [text, setText] = useState(value);
  const [applied, setApplied] = useState(value);

  // Back/forward changed the applied search: show it, unless it is what is already typed.
  if (value !== applied) {
    setApplied(value);
    if (value !== text.trim()) setText(value);
  }

  useEffect(() => {
    if (text.trim() === value) return;
    const timer = setTimeout(() => onSearch(text.trim()), delayMs);
    return () => clearTimeout(timer);
  }, [text, value, onSearch, delayMs]);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (text.trim() !== value) onSearch(text.trim());
  };

  return (
    <form role="search" onSubmit={submit} className="space-y-1.5">
      <label htmlFor={`${id}-q`} className="block text-lg font-semibold text-ink">
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-base text-ink-muted">
          {hint}
        </p>
      )}
      <div className="flex gap-3">
        <TextInput
          id={`${id}-q`}
          type="search"
          value={text}
          onChange={(event) => setText(event.target.value)}
          aria-describedby={hint ? `${id}-hint` : undefined}
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          enterKeyHint="search"
        />
        {text && (
          <Button variant="secondary" onClick={() => setText('')}>
            Clear
          </Button>
        )}
      </div>
    </form>
  );
}
