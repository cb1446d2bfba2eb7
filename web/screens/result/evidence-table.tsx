/**
 * Each piece of evidence with its value against its threshold. A value past its threshold
 * is marked with a symbol and the words "past the limit", not by colour alone.
 */
import { t } from '../../i18n/index.js';

export interface EvidenceRow {
  key: string;
  label: string;
  value: string;
  threshold: string;
  exceeds: boolean;
  note?: string | undefined;
}

export function EvidenceTable({ rows }: { rows: readonly EvidenceRow[] }) {
  return (
    <table class="evidence">
      <thead>
        <tr>
          <th scope="col">{t('result.evidence.what')}</th>
          <th scope="col">{t('result.evidence.value')}</th>
          <th scope="col">{t('result.evidence.threshold')}</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.key} class={r.exceeds ? 'evidence__row--over' : undefined}>
            <th scope="row">
              {r.label}
              {r.note && <span class="evidence__note">{r.note}</span>}
            </th>
            <td>
              <strong>{r.value}</strong>
              {r.exceeds && (
                <span class="evidence__over">
                  <span aria-hidden="true"> ▲ </span>
                  {t('result.evidence.over')}
                </span>
              )}
            </td>
            <td>{r.threshold}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
