/**
 * Messages between tabs of the app about surveys, over the BroadcastChannel
 * 'grainline-surveys'. Stores nothing. Used to notice at once that another tab saved the
 * survey being edited here (the revision check at save time is the guarantee; this is the
 * early warning), and which surveys are open in more than one tab.
 *
 * Messages from other tabs may come from another build of the app, so each is checked and
 * anything unrecognised is ignored. Where BroadcastChannel is missing, nothing is sent.
 */

export const CHANNEL_NAME = 'grainline-surveys';

export type TabMessage =
  /** This tab opened `id` for editing; others that have it open answer 'here'. */
  | { type: 'open'; id: string; tabId: string }
  | { type: 'here'; id: string; tabId: string }
  | { type: 'closed'; id: string; tabId: string }
  /** A new current revision of `id` was saved by `tabId`. */
  | { type: 'saved'; id: string; tabId: string; revision: number }
  /** Many surveys changed at once (an import); `ids` null means "any". */
  | { type: 'changed'; ids: string[] | null; tabId: string }
  /** Revision `revision` of `id` was exported at `at`. */
  | { type: 'exported'; id: string; tabId: string; revision: number; at: string };

function isTabMessage(v: unknown): v is TabMessage {
  if (typeof v !== 'object' || v === null) return false;
  const m = v as Record<string, unknown>;
  if (typeof m['tabId'] !== 'string') return false;
  switch (m['type']) {
    case 'open':
    case 'here':
    case 'closed':
      return typeof m['id'] === 'string';
    case 'saved':
      return typeof m['id'] === 'string' && typeof m['revision'] === 'number';
    case 'changed':
      return (
        m['ids'] === null ||
        (Array.isArray(m['ids']) && m['ids'].every((i) => typeof i === 'string'))
      );
    case 'exported':
      return (
        typeof m['id'] === 'string' &&
        typeof m['revision'] === 'number' &&
        typeof m['at'] === 'string'
      );
    default:
      return false;
  }
}

export class TabChannel {
  private readonly channel: BroadcastChannel | null;
  private readonly listeners = new Set<(m: TabMessage) => void>();

  constructor(
    readonly tabId: string,
    name: string = CHANNEL_NAME,
  ) {
    this.channel = typeof BroadcastChannel === 'function' ? new BroadcastChannel(name) : null;
    if (this.channel) {
      this.channel.onmessage = (event: MessageEvent<unknown>) => {
        const m = event.data;
        if (!isTabMessage(m) || m.tabId === this.tabId) return;
        for (const listener of [...this.listeners]) listener(m);
      };
    }
  }

  post(message: TabMessage): void {
    try {
      this.channel?.postMessage(message);
    } catch {
      // A closed channel (page going away): the revision check still protects the data.
    }
  }

  subscribe(listener: (m: TabMessage) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  close(): void {
    this.listeners.clear();
    this.channel?.close();
  }
}
