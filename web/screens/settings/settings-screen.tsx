/** Settings: units, display, storage. (The storage and units parts arrive with their issues.) */
import { t } from '../../i18n/index.js';
import { checkForUpdate } from '../../app/service-worker.js';

export function SettingsScreen() {
  return (
    <main class="screen" id="main">
      <h1>{t('nav.settings')}</h1>
      <p>
        <button type="button" class="button" onClick={() => void checkForUpdate()}>
          {t('settings.checkUpdate')}
        </button>
      </p>
      <p class="muted">{t('settings.build', { build: __BUILD_ID__ })}</p>
    </main>
  );
}
