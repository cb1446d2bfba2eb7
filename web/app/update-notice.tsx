/**
 * A non-blocking strip at the bottom of the screen saying a new version is ready. It never
 * covers the form and never reloads on its own.
 */
import { t } from '../i18n/index.js';
import { useStore } from './store.js';
import { applyUpdate, postponeUpdate, updateState } from './service-worker.js';

export function UpdateNotice() {
  const { phase } = useStore(updateState);
  if (phase === 'none') return null;
  return (
    <aside class="update-notice" role="status" aria-live="polite">
      <p>
        {phase === 'applying'
          ? t('update.saving')
          : phase === 'flush-failed'
            ? t('update.flushFailed')
            : t('update.ready')}
      </p>
      {phase !== 'applying' && (
        <div class="update-notice__actions">
          <button type="button" class="button button--primary" onClick={() => void applyUpdate()}>
            {t('update.apply')}
          </button>
          <button type="button" class="button" onClick={postponeUpdate}>
            {t('update.later')}
          </button>
        </div>
      )}
    </aside>
  );
}
