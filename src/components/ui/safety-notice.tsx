import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export type SignalWord = 'danger' | 'warning' | 'caution' | 'notice';

// ANSI Z535 panels: the signal word in capitals on its safety colour, with the safety alert symbol.
const PANELS: Record<SignalWord, { header: string; body: string; symbolInk: string }> = {
  danger: { header: 'bg-danger text-danger-ink', body: 'border-danger bg-danger-soft', symbolInk: 'fill-danger' },
  warning: { header: 'bg-warning text-warning-ink', body: 'border-warning bg-warning-soft', symbolInk: 'fill-warning' },
  caution: { header: 'bg-caution text-caution-ink', body: 'border-caution bg-caution-soft', symbolInk: 'fill-caution' },
  notice: { header: 'bg-notice text-notice-ink italic', body: 'border-notice bg-notice-soft', symbolInk: '' },
};

/** The panel level for a signal word as stored (DANGER, WARNING, CAUTION, NOTICE). */
export const signalLevel = (word: string): SignalWord => word.toLowerCase() as SignalWord;

export const LOCKOUT_DEFERRAL =
  'Follow your plant’s lockout/tagout procedure, local electrical codes and licensed practice. They take precedence over this app.';

interface SafetyNoticeProps {
  level: SignalWord;
  children: ReactNode;
  /** Set when the message itself already ends by deferring to the plant's procedure, so it is not said twice. */
  defersAlready?: boolean;
}

/** True when a message already defers to the plant's lockout procedure, local codes and licensed practice. */
export const defersToPlant = (text: string) => /lockout procedure, local codes and licensed practice/i.test(text);

/** A safety message that always ends by deferring to the plant's own procedure. */
export function SafetyNotice({ level, children, defersAlready = false }: SafetyNoticeProps) {
  const panel = PANELS[level];
  return (
    <section aria-label={`${level.toUpperCase()} safety notice`} className={cn('overflow-hidden rounded-lg border-2', panel.body)}>
      <p className={cn('flex items-center gap-2 px-4 py-2 text-xl font-bold uppercase tracking-wide', panel.header)}>
        {/* ANSI Z535: NOTICE is about property, so it carries no safety alert symbol. */}
        {level !== 'notice' && (
          <svg aria-hidden="true" viewBox="0 0 24 24" className="h-6 w-6">
            <path d="M12 2 L23 21 H1 Z" className="fill-current" />
            <path d="M11 8 h2 v7 h-2 Z M11 16.5 h2 v2 h-2 Z" className={panel.symbolInk} />
          </svg>
        )}
        {level}
      </p>
      <div className="space-y-2 px-4 py-3 text-lg text-ink">
        <div>{children}</div>
        {!defersAlready && <p className="font-medium">{LOCKOUT_DEFERRAL}</p>}
      </div>
    </section>
  );
}
