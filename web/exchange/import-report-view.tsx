/**
 * What an import did, in sentences: how many surveys were added or updated, duplicates
 * skipped, conflicts kept (each named), and every refused Feature with its reasons. All
 * imported text (addresses, ids, inspectors) is rendered as text, never as markup.
 */
import { useEffect, useRef } from 'preact/hooks';
import { t } from '../i18n/index.js';
import type { ImportReport } from './import-file.js';

/** At most this many refused Features are listed one by one (the rest are counted). */
const MAX_LISTED = 200;

export function ImportReportView({ report }: { report: ImportReport }) {
  const box = useRef<HTMLDivElement>(null);
  // The report appears below the buttons: bring it into view, or it goes unseen on a phone.
  useEffect(() => {
    box.current?.scrollIntoView?.({ block: 'start', behavior: 'smooth' });
  }, [report]);
  if (report.status === 'refused') {
    return (
      <div ref={box} class="gl-report gl-report--error" role="alert">
        <p class="gl-report__title">{t('exchange.import.refused', { file: report.fileName })}</p>
        <p>{report.reason}</p>
        <p class="muted">{t('exchange.import.untouched')}</p>
      </div>
    );
  }
  const rejected = report.rejected;
  const list =
    rejected.length > 0 ? (
      <details class="gl-report__rejected" open={rejected.length <= 5}>
        <summary>{t('exchange.import.rejectedList', { count: rejected.length })}</summary>
        <ol>
          {rejected.slice(0, MAX_LISTED).map((r) => (
            <li key={r.index}>
              <strong>
                {t('exchange.import.feature', { n: r.index + 1 })}
                {r.address ? ` — ${r.address}` : ''}
              </strong>
              {r.surveyId ? <span class="gl-report__id"> {r.surveyId}</span> : null}
              <ul>
                {r.reasons.map((reason, i) => (
                  <li key={i}>{reason}</li>
                ))}
              </ul>
            </li>
          ))}
        </ol>
        {rejected.length > MAX_LISTED ? (
          <p class="muted">
            {t('exchange.import.moreRejected', { count: rejected.length - MAX_LISTED })}
          </p>
        ) : null}
      </details>
    ) : null;

  if (report.status === 'refused-strict') {
    return (
      <div ref={box} class="gl-report gl-report--error" role="alert">
        <p class="gl-report__title">
          {t('exchange.import.strictRefused', { file: report.fileName, bad: rejected.length })}
        </p>
        <p class="muted">{t('exchange.import.untouched')}</p>
        {list}
      </div>
    );
  }
  if (report.status === 'failed') {
    return (
      <div ref={box} class="gl-report gl-report--error" role="alert">
        <p class="gl-report__title">{t('exchange.import.failed', { file: report.fileName })}</p>
        <p>{report.reason}</p>
        <p class="muted">{t('exchange.import.untouched')}</p>
        {list}
      </div>
    );
  }
  return (
    <div ref={box} class="gl-report" role="status">
      <p class="gl-report__title">{t('exchange.import.done', { file: report.fileName })}</p>
      <ul class="gl-report__counts">
        <li>{t('exchange.import.accepted', { count: report.accepted })}</li>
        <li>{t('exchange.import.newSurveys', { count: report.newSurveys })}</li>
        <li>{t('exchange.import.newRevisions', { count: report.newRevisions })}</li>
        {report.newerCurrent > 0 ? (
          <li>{t('exchange.import.newerCurrent', { count: report.newerCurrent })}</li>
        ) : null}
        <li>{t('exchange.import.duplicates', { count: report.duplicates })}</li>
        {report.migrated > 0 ? (
          <li>{t('exchange.import.migrated', { count: report.migrated })}</li>
        ) : null}
        {report.withoutLocation > 0 ? (
          <li>{t('exchange.import.withoutLocation', { count: report.withoutLocation })}</li>
        ) : null}
        {report.photosAdded > 0 || report.photosFailed > 0 ? (
          <li>
            {t('exchange.import.photos', {
              added: report.photosAdded,
              failed: report.photosFailed,
            })}
          </li>
        ) : null}
      </ul>
      {report.conflicts.length > 0 ? (
        <div class="gl-report__conflicts">
          <p>
            <strong>{t('exchange.import.conflicts', { count: report.conflicts.length })}</strong>
          </p>
          <ul>
            {report.conflicts.map((c) => (
              <li key={`${c.surveyId}#${c.revision}#${c.variantInspector}`}>
                {t('exchange.import.conflict', {
                  address: c.address.trim() || c.surveyId,
                  revision: c.revision,
                  holder: c.holderInspector || '—',
                  variant: c.variantInspector || '—',
                })}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {list}
    </div>
  );
}
