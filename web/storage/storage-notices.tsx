/**
 * `StorageNotices`: what the storage layer needs the inspector to know, on every screen.
 * Stores nothing; reads the page's SurveyStore.
 *
 * - Records that could not be read: how many are kept apart (quarantined), with a button to
 *   export them as a file (they are never dropped). Shown on start when there are any, and
 *   again whenever a read quarantines more.
 * - Another tab updated the database: this tab has flushed and closed its connection and
 *   must be reloaded (a button does it).
 * - This tab's update waits for an older tab to close.
 * - The browser may delete the data (not persisted, app not installed: persistence.ts):
 *   once there is a survey to lose, urge installing and exporting. Hidden on request for a
 *   week (remembered in settings), then shown again while the risk lasts.
 *
 * Sentences come from the schema catalogue's `storage` section; no text lives here.
 */
import { useEffect, useState } from 'preact/hooks';
import { en, type MessageCatalogue } from '../../forms/index.js';
import type { StoreNotice } from './connection.js';
import { getDefaultStore } from './default-store.js';
import type { SurveyStore } from './survey-store.js';

/**
 * How long a hidden eviction warning stays hidden. WebKit deletes script-written data of a
 * site not visited for seven days (webkit.org, "Full Third-Party Cookie Blocking and More",
 * 2020), so the warning comes back within that time. Source: that post; the week is ours.
 */
const EVICTION_HIDE_MS = 7 * 24 * 60 * 60 * 1000;
const EVICTION_HIDDEN_UNTIL = 'evictionNoticeHiddenUntil';

/** An older tab gets this long to save and close before the wait is shown (ours, no source). */
const BLOCKED_NOTICE_DELAY_MS = 1500;

/**
 * The notices sit above the screens, outside their padding: keep them off the edges. Set
 * through the style property (allowed by the CSP, unlike a style attribute in the HTML).
 */
const BOX = { margin: '8px' } as const;

type ShellNotice = Extract<StoreNotice, { type: 'reload-required' | 'upgrade-blocked' }>;

/** Saves text as a file through a temporary link (no share sheet: this is for support). */
function download(text: string, name: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'application/json' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  a.hidden = true;
  document.body.append(a);
  a.click();
  a.remove();
  // Revoke later: some browsers start the download only after the click handler returns.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

export function StorageNotices(props: { store?: SurveyStore; catalogue?: MessageCatalogue }) {
  const store = props.store ?? getDefaultStore();
  const s = (props.catalogue ?? en).storage;
  const [unreadable, setUnreadable] = useState(0);
  const [hidden, setHidden] = useState(false);
  const [shell, setShell] = useState<ShellNotice | null>(null);
  const [exportError, setExportError] = useState<string | null>(null);
  const [eviction, setEviction] = useState<string | null>(null);

  useEffect(() => {
    let alive = true;
    let blockedTimer: ReturnType<typeof setTimeout> | undefined;
    const refresh = () =>
      void store.countUnreadable().then(
        (n) => alive && setUnreadable(n),
        () => undefined, // the screens report storage failures themselves
      );
    const checkEviction = async () => {
      const status = await store.storageStatus();
      if (!status.evictionRisk || status.warning === null) {
        if (alive) setEviction(null);
        return;
      }
      if ((await store.countSurveys()) === 0) return; // nothing to lose yet
      const until = await store.getSetting(EVICTION_HIDDEN_UNTIL);
      if (typeof until === 'string' && Date.parse(until) > Date.now()) return;
      if (alive) setEviction(status.warning);
    };
    const evictionCheck = () => void checkEviction().catch(() => undefined);
    refresh();
    evictionCheck();
    const off = store.onNotice((n) => {
      if (n.type === 'persistence') {
        evictionCheck();
      } else if (n.type === 'quarantined') {
        setHidden(false);
        refresh();
      } else if (n.type === 'reload-required') {
        setShell(n);
      } else if (n.type === 'upgrade-blocked') {
        // An older tab usually closes within a moment (after saving its draft): say so
        // only if it does not.
        clearTimeout(blockedTimer);
        blockedTimer = setTimeout(() => alive && setShell(n), BLOCKED_NOTICE_DELAY_MS);
      } else if (n.type === 'upgrade-unblocked') {
        clearTimeout(blockedTimer);
        setShell((s) => (s?.type === 'upgrade-blocked' ? null : s));
      }
    });
    return () => {
      alive = false;
      clearTimeout(blockedTimer);
      off();
    };
  }, [store]);

  const hideEviction = () => {
    setEviction(null);
    const until = new Date(Date.now() + EVICTION_HIDE_MS).toISOString();
    void store.setSetting(EVICTION_HIDDEN_UNTIL, until).catch(() => undefined);
  };

  const exportKept = async () => {
    setExportError(null);
    try {
      const text = await store.exportQuarantined();
      const day = new Date().toISOString().slice(0, 10);
      download(text, `grainline-kept-apart-${day}.json`);
    } catch (error) {
      setExportError(s.exportQuarantinedFailed(error instanceof Error ? error.message : ''));
    }
  };

  return (
    <>
      {shell && (
        <div
          class="notice notice--alert storage-notice"
          style={BOX}
          role="alert"
          data-storage-notice={shell.type}
        >
          <p>{shell.message}</p>
          {shell.type === 'reload-required' && (
            <button
              type="button"
              class="button button--primary"
              onClick={() => window.location.reload()}
            >
              {s.reloadNow}
            </button>
          )}
        </div>
      )}
      {eviction && (
        <div
          class="notice storage-notice"
          style={BOX}
          role="status"
          data-storage-notice="eviction-risk"
        >
          <p>{eviction}</p>
          <button type="button" class="button" onClick={hideEviction}>
            {s.hideNotice}
          </button>
        </div>
      )}
      {unreadable > 0 && !hidden && (
        <div
          class="notice storage-notice"
          style={BOX}
          role="status"
          data-storage-notice="quarantined"
        >
          <p>{s.quarantined(unreadable)}</p>
          {exportError && <p role="alert">{exportError}</p>}
          <div class="button-row">
            <button type="button" class="button" onClick={() => void exportKept()}>
              {s.exportQuarantined}
            </button>
            <button type="button" class="button" onClick={() => setHidden(true)}>
              {s.hideNotice}
            </button>
          </div>
        </div>
      )}
    </>
  );
}
