/** The building list: the first screen an inspector sees. */
import { t } from '../../i18n/index.js';
import { CautionNote } from '../../app/caution-note.js';

export function HomeScreen() {
  return (
    <main class="screen" id="main">
      <header class="screen__header">
        <h1>{t('home.title')}</h1>
      </header>
      <p>{t('home.empty')}</p>
      <p class="stack">
        <button type="button" class="button button--primary button--wide">
          {t('nav.newSurvey')}
        </button>
        <button type="button" class="button button--wide">
          {t('home.loadDemo')}
        </button>
      </p>
      <CautionNote compact />
    </main>
  );
}
