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
 *
 * Sentences come from the schema catalogue's `storage` section; no text lives here.
 */
import { useEffect, useState } from 'preact/hooks';
import { en, type MessageCatalogue } from '../../forms/index.js';
import type { StoreNotice } from './connection.js';
import { getDefaultStore } from './default-store.js';
import type { SurveyStore } from './survey-store.js';

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

  useEffect(() => {
    let alive = true;
    const refresh = () =>
      void store.countUnreadable().then(
        (n) => alive && setUnreadable(n),
        () => undefined, // the screens report storage failures themselves
      );
    refresh();
    const off = store.onNotice((n) => {
      if (n.type === 'quarantined') {
        setHidden(false);
        refresh();
      } else if (n.type === 'reload-required' || n.type === 'upgrade-blocked') {
        setShell(n);
      }
    });
    return () => {
      alive = false;
      off();
    };
  }, [store]);

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
      {unreadable > 0 && !hidden && (
        <div class="notice storage-notice" role="status" data-storage-notice="quarantined">
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
