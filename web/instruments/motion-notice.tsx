/** What to tell the inspector when the motion sensor is not (yet) available. */
import { t } from '../i18n/index.js';
import type { MotionState } from './use-motion.js';

export function MotionNotice({ state, onRetry }: { state: MotionState; onRetry: () => void }) {
  if (state === 'off' || state === 'asking' || state === 'granted') return null;
  const key =
    state === 'denied'
      ? 'instruments.access.denied'
      : state === 'unsupported'
        ? 'instruments.access.unsupported'
        : state === 'insecure'
          ? 'instruments.access.insecure'
          : 'instruments.access.noReadings';
  return (
    <div class="instrument__notice" role="alert">
      <p>{t(key)}</p>
      {(state === 'denied' || state === 'silent') && (
        <>
          <p class="instrument__hint">{t('instruments.access.askHint')}</p>
          <button type="button" class="button button--wide" onClick={onRetry}>
            {t('instruments.access.ask')}
          </button>
        </>
      )}
    </div>
  );
}
