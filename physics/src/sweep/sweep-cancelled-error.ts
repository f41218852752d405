/**
 * Thrown when a sweep's AbortSignal fires. Its `name` is 'AbortError', as for fetch and the DOM,
 * so callers can treat every cancellation alike.
 */
export class SweepCancelledError extends Error {
  override readonly name = 'AbortError';

  constructor(done: number, total: number) {
    super(`sweep cancelled after ${done} of ${total} poses`);
  }
}
