/** The team lead's map of screened buildings. (Placeholder until the map issue lands.) */
import { t } from '../i18n/index.js';

export function MapScreen() {
  return (
    <main class="screen" id="main">
      <h1>{t('nav.map')}</h1>
    </main>
  );
}
