import { useSyncExternalStore } from 'react';
import { isUnauthorized } from './api-error';

/**
 * The session ended while someone was working (signed out on another tab, timed out, the server
 * restarted with a new secret). The page stays where it is and a sign-in dialog opens over it; writes
 * that met the 401 wait here and are sent again once the person has signed in.
 */
let expired = false;
let waiters: Array<() => void> = [];
const listeners = new Set<() => void>();
const notify = () => listeners.forEach((listener) => listener());

export const sessionExpiry = {
  isExpired: () => expired,
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => {
      listeners.delete(listener);
    };
  },
  expire() {
    if (expired) return;
    expired = true;
    notify();
  },
  /** Signed in again: the waiting writes go out. */
  renewed() {
    expired = false;
    const waiting = waiters;
    waiters = [];
    waiting.forEach((resume) => resume());
    notify();
  },
  /** A deliberate sign-out or a different person: waiting writes are dropped with the page. */
  abandon() {
    expired = false;
    waiters = [];
    notify();
  },
  waitForSignIn: () => new Promise<void>((resolve) => waiters.push(resolve)),
};

export const useSessionExpired = () => useSyncExternalStore(sessionExpiry.subscribe, sessionExpiry.isExpired, sessionExpiry.isExpired);

/** Sends a write; on a 401 it waits until the person has signed in again in the dialog, then sends the very same write again. */
export async function withSignIn<T>(send: () => Promise<T>): Promise<T> {
  for (;;) {
    try {
      return await send();
    } catch (error) {
      if (!isUnauthorized(error)) throw error;
      sessionExpiry.expire();
      await sessionExpiry.waitForSignIn();
    }
  }
}
