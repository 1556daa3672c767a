import { CancelledError } from '../errors.ts';

/**
 * Cooperative cancellation, injected rather than taken from globals: long loops call
 * `throwIfCancelled()` every so often. The CLI wires it to SIGINT, the app to a button,
 * tests to whatever they like.
 */
export interface CancelToken {
  readonly cancelled: boolean;
  throwIfCancelled(): void;
}

/** A token that never cancels (the default). */
export const neverCancel: CancelToken = {
  cancelled: false,
  throwIfCancelled() {},
};

/** A token with a `cancel()` switch. */
export function cancelSource(what = 'computation'): CancelToken & { cancel(): void } {
  let cancelled = false;
  return {
    get cancelled() {
      return cancelled;
    },
    cancel() {
      cancelled = true;
    },
    throwIfCancelled() {
      if (cancelled) throw new CancelledError(what);
    },
  };
}
