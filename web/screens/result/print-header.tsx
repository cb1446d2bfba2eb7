/** The head of the printed one-page report: building, place, inspector, time. Print only. */
import type { SurveyRecord } from '../../../forms/index.js';
import { formatNumber, type UnitSystem } from '../../../forms/units/index.js';
import { t } from '../../i18n/index.js';

export function PrintHeader({ record }: { record: SurveyRecord; system: UnitSystem }) {
  const loc = record.location;
  return (
    <header class="print-only print-header">
      <p class="print-header__app">{t('result.printTitle')}</p>
      <p class="print-header__address">{record.address || t('survey.untitled')}</p>
      <p>
        {loc
          ? `${formatNumber(loc.lat, 'coord')}, ${formatNumber(loc.lon, 'coord')}`
          : t('place.noPosition')}
        {' · '}
        {t('result.printInspector', {
          inspector: record.inspector || '—',
          team: record.team || '—',
          when: new Date(record.updatedAt).toLocaleString(),
        })}
      </p>
    </header>
  );
}
