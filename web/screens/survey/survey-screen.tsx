/** One survey, step by step. (Placeholder until the field-forms issue lands.) */
import { t } from '../../i18n/index.js';

export function SurveyScreen(_props: { params: { id?: string; step?: string } }) {
  return (
    <main class="screen" id="main">
      <h1>{t('nav.newSurvey')}</h1>
    </main>
  );
}
