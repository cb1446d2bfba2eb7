/** The standing safety caution, shown on the home and result screens and in print. */
import { t } from '../i18n/index.js';

export function CautionNote({ compact = false }: { compact?: boolean }) {
  return (
    <section
      class={compact ? 'caution caution--compact' : 'caution'}
      aria-labelledby="caution-title"
    >
      <h2 id="caution-title" class="caution__title">
        <span aria-hidden="true">⚠ </span>
        {t('caution.title')}
      </h2>
      <p class="caution__body">{t('caution.body')}</p>
    </section>
  );
}
