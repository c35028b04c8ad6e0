import { onlineManager, useMutation } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { isApiError } from '@/lib/api-error';
import { withSignIn } from '@/lib/session-expiry';

/** The request never reached the server (or its answer never came back): worth sending again. */
export const isNetworkFailure = (error: unknown) => isApiError(error) && (error.status === 0 || error.status >= 500);

// 2 s, 4 s, 8 s … capped at 30 s: quick when a door swung shut, gentle when the plant Wi-Fi is down.
export const retryDelayMs = (attempt: number) => Math.min(2000 * 2 ** attempt, 30_000);

export interface ResilientSave<TVars, TData> {
  save: (vars: TVars) => void;
  /** Sends the failed save again now, with the same variables (and so the same client id). */
  retryNow: () => void;
  isSaving: boolean;
  isPaused: boolean;
  /** A save that has not reached the server yet and will be sent again. */
  isWaitingToRetry: boolean;
  /** The server refused the save (4xx): not retried; `error` holds its message and fields. */
  isRejected: boolean;
  isSaved: boolean;
  error: unknown;
  variables: TVars | undefined;
  data: TData | undefined;
  /**
   * The save on its way now (sending, or waiting for a sign-in), read in event handlers: it is set
   * when the save starts, before the screen shows it, so a blur right after cannot send it twice.
   */
  inFlight: () => TVars | undefined;
  /** Forgets a refused save (the person chose the server's value instead). */
  reset: () => void;
}

/**
 * A TanStack mutation for saves made at the press. A network failure is retried with backoff,
 * at once when the device comes back online, or when the person taps Retry; each retry sends the
 * very same variables, so the client UUID in them lets the server drop a duplicate. A 4xx is the
 * server's considered answer and is shown, never retried.
 */
export function useResilientSave<TVars, TData>(options: {
  mutationFn: (vars: TVars) => Promise<TData>;
  onSuccess?: (data: TData, vars: TVars) => void;
}): ResilientSave<TVars, TData> {
  // Retries are scheduled here rather than by TanStack's own `retry`, so that Retry can send at
  // once without a second request racing a sleeping one.
  // A 401 holds the save until the person has signed in again over the page, then sends it as it was.
  const mutation = useMutation({ mutationFn: (vars: TVars) => withSignIn(() => options.mutationFn(vars)), onSuccess: options.onSuccess, retry: false });
  const { mutate, isPending } = mutation;
  const [waiting, setWaiting] = useState<{ vars: TVars; attempt: number } | null>(null);
  const inFlight = useRef<TVars | undefined>(undefined);

  const send = useCallback(
    (vars: TVars, attempt: number) => {
      inFlight.current = vars;
      mutate(vars, {
        onSuccess: () => setWaiting(null),
        onError: (error) => setWaiting(isNetworkFailure(error) ? { vars, attempt } : null),
        onSettled: () => {
          if (inFlight.current === vars) inFlight.current = undefined;
        },
      });
    },
    [mutate],
  );

  const save = useCallback(
    (vars: TVars) => {
      setWaiting(null);
      send(vars, 0);
    },
    [send],
  );

  const retryNow = useCallback(() => {
    if (waiting) send(waiting.vars, waiting.attempt + 1);
  }, [waiting, send]);

  // While a save waits: send it again after the backoff delay, or at once when the device is back online.
  useEffect(() => {
    if (!waiting || isPending) return;
    const again = () => send(waiting.vars, waiting.attempt + 1);
    const timer = setTimeout(() => {
      if (onlineManager.isOnline()) again();
    }, retryDelayMs(waiting.attempt));
    const unsubscribe = onlineManager.subscribe((online) => {
      if (online) again();
    });
    return () => {
      clearTimeout(timer);
      unsubscribe();
    };
  }, [waiting, isPending, send]);

  return {
    save,
    retryNow,
    isSaving: mutation.isPending,
    // Paused: TanStack holds a save made while the device was offline until it is back online.
    isWaitingToRetry: waiting !== null || mutation.isPaused,
    isPaused: mutation.isPaused,
    isRejected: mutation.isError && !isNetworkFailure(mutation.error),
    isSaved: mutation.isSuccess,
    error: mutation.error,
    variables: mutation.variables,
    data: mutation.data,
    inFlight: () => inFlight.current,
    reset: () => {
      setWaiting(null);
      mutation.reset();
    },
  };
}
