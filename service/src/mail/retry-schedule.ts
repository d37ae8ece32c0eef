/**
 * When a failed send is tried again: 30 s after the first failure, then doubling (1, 2, 4 ... min)
 * up to one hour between tries, and hourly after that, until the message has been retried for a
 * day; then it is marked failed (kept, shown in the outbox, and an admin can queue it again).
 * A mail service that is down for a night therefore loses nothing.
 */
export const FIRST_WAIT_MS = 30_000;
export const LONGEST_WAIT_MS = 60 * 60_000;
export const KEEP_TRYING_MS = 24 * 60 * 60_000;

/** The wait after the `attempts`-th failed try (attempts counts from 1). */
export function backoffMs(attempts: number): number {
  return Math.min(FIRST_WAIT_MS * 2 ** Math.max(0, attempts - 1), LONGEST_WAIT_MS);
}

/** Tries before a message is marked failed: the fewest whose waits add up to KEEP_TRYING_MS. */
export const MAX_ATTEMPTS = (() => {
  let waited = 0;
  let attempts = 1;
  while (waited < KEEP_TRYING_MS) waited += backoffMs(attempts++);
  return attempts;
})();
