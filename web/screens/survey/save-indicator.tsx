/**
 * Whether the inspector's last change is on the device. "Saved" appears only after the
 * IndexedDB transaction completed (the draft saver's saveState); while a change waits or is
 * being written it says so, and a failure says what to do, with a button to try again.
 */
import type { SaveState } from '../../storage/index.js';
import { t } from '../../i18n/index.js';

export function SaveIndicator(props: {
  state: SaveState;
  error: string | null;
  onRetry: () => void;
}) {
  const { state } = props;
  const symbol = state === 'saved' ? '✓' : state === 'error' ? '✖' : '…';
  const text =
    state === 'saved'
      ? t('save.saved')
      : state === 'error'
        ? t('save.failed')
        : state === 'saving'
          ? t('save.saving')
          : t('save.unsaved');
  return (
    <div class={`save-indicator save-indicator--${state}`}>
      <p role="status" aria-live="polite" class="save-indicator__text" data-save-state={state}>
        <span aria-hidden="true">{symbol} </span>
        {text}
      </p>
      {state === 'error' && props.error && (
        <div class="save-indicator__error" role="alert">
          <p>{props.error}</p>
          <button type="button" class="button button--small" onClick={props.onRetry}>
            {t('save.retry')}
          </button>
        </div>
      )}
    </div>
  );
}
