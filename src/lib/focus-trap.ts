import type { KeyboardEvent } from 'react';

/** The controls a person can Tab to inside `root`, in page order. */
export const focusables = (root: HTMLElement | null) =>
  root ? [...root.querySelectorAll<HTMLElement>('input:not([disabled]), textarea:not([disabled]), button:not([disabled]), a[href]')] : [];

/** Keeps Tab inside a modal: from its last control back to the first, and Shift+Tab the other way. */
export function keepTabInside(event: KeyboardEvent, root: HTMLElement | null) {
  if (event.key !== 'Tab') return;
  const all = focusables(root);
  const first = all[0];
  const last = all.at(-1);
  if (event.shiftKey && document.activeElement === first) {
    event.preventDefault();
    last?.focus();
  } else if (!event.shiftKey && document.activeElement === last) {
    event.preventDefault();
    first?.focus();
  }
}
