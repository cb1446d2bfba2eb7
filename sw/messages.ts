/** Messages the page sends to the service worker. */

/** The page has flushed its drafts and asks the waiting worker to take over. */
export const SKIP_WAITING = 'GRAINLINE_SKIP_WAITING';

export function isSkipWaitingMessage(data: unknown): boolean {
  return (
    typeof data === 'object' && data !== null && (data as { type?: unknown }).type === SKIP_WAITING
  );
}
