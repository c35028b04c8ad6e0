import { useId, type ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { cn } from '@/lib/cn';
import { choiceCardVariants } from './control-variants';
import { FieldError } from './field-error';

export interface RadioCardOption {
  value: string;
  label: string;
  /** A word shown on the card, e.g. "Suggested": text, so it does not rest on colour. */
  badge?: string;
  detail?: ReactNode;
}

interface RadioCardsProps {
  legend: string;
  hint?: ReactNode;
  options: ReadonlyArray<RadioCardOption>;
  error?: string;
  registration: UseFormRegisterReturn;
  columns?: 1 | 2;
}

/** One choice among a few, as large cards with a visible radio dot; arrow keys move between them. */
export function RadioCards({ legend, hint, options, error, registration, columns = 2 }: RadioCardsProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = `${id}-error`;
  const describedBy = [hintId, error ? errorId : undefined].filter(Boolean).join(' ') || undefined;

  return (
    <fieldset className="space-y-3" aria-describedby={describedBy}>
      <legend className="text-lg font-semibold text-ink">{legend}</legend>
      {hint && (
        <div id={hintId} className="text-base text-ink-muted">
          {hint}
        </div>
      )}
      <div className={cn('grid gap-3', columns === 2 && 'sm:grid-cols-2')}>
        {options.map((option) => {
          const optionId = `${id}-${option.value}`;
          return (
            <label
              key={option.value}
              htmlFor={optionId}
              className={choiceCardVariants({ align: 'start' })}
            >
              <input
                id={optionId}
                type="radio"
                value={option.value}
                className="mt-0.5 h-7 w-7 shrink-0 accent-accent"
                aria-invalid={error ? true : undefined}
                aria-labelledby={`${optionId}-name`}
                aria-describedby={option.detail ? `${optionId}-detail` : undefined}
                {...registration}
              />
              <span className="min-w-0 flex-1 space-y-1">
                <span id={`${optionId}-name`} className="flex flex-wrap items-center gap-2">
                  <span className="font-semibold">{option.label}</span>{' '}
                  {option.badge && (
                    <span className="rounded border-2 border-accent px-2 text-base font-semibold uppercase tracking-wide text-accent">{option.badge}</span>
                  )}
                </span>
                {option.detail && (
                  <span id={`${optionId}-detail`} className="block text-base text-ink-muted">
                    {option.detail}
                  </span>
                )}
              </span>
            </label>
          );
        })}
      </div>
      <FieldError id={errorId} message={error} />
    </fieldset>
  );
}
