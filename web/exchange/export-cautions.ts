/**
 * The cautions every export carries, so a file that travels without the app still says what
 * its numbers are (and are not).
 */
import { t } from '../i18n/index.js';

/** The full caution, as the app shows it. */
export function exportCaution(): string {
  return t('caution.body');
}

/** The one-line caution repeated on every Feature and CSV row, so a copied row keeps it. */
export function shortCaution(): string {
  return t('exchange.caution.short');
}
