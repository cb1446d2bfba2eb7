/**
 * The Import and Export buttons, for the building list and the map: import a GeoJSON or zip
 * from other inspectors (optionally all-or-nothing), export GeoJSON, the CSV summary, or a
 * zip with photos, shared through the system share sheet where the browser can, downloaded
 * otherwise. Every export carries the cautions; the caution is also shown here.
 */
import '../styles/map.css';
import { useRef, useState } from 'preact/hooks';
import type { SurveyRecord } from '../../forms/index.js';
import { t } from '../i18n/index.js';
import {
  allSurveys,
  exportCsvFile,
  exportGeoJsonFile,
  exportZipFile,
  importFile,
  markAsExported,
} from './device-exchange.js';
import type { ImportReport } from './import-file.js';
import { ImportReportView } from './import-report-view.js';
import { shareOrDownload } from './share-file.js';

export type ExchangeAction = 'import' | 'geojson' | 'csv' | 'zip';

export interface ExchangeActionsProps {
  /** The surveys an export holds; default: every current survey on the device. */
  records?: () => Promise<SurveyRecord[]>;
  /** Called after an import wrote something, so the caller can reload what it shows. */
  onImported?: (report: ImportReport) => void;
  /** Which buttons to show (default: all). */
  actions?: readonly ExchangeAction[];
}

type Busy = null | 'import' | 'export';

export function ExchangeActions({ records, onImported, actions }: ExchangeActionsProps) {
  const show = new Set<ExchangeAction>(actions ?? ['import', 'geojson', 'csv', 'zip']);
  const input = useRef<HTMLInputElement>(null);
  const [strict, setStrict] = useState(false);
  const [busy, setBusy] = useState<Busy>(null);
  const [report, setReport] = useState<ImportReport | null>(null);
  const [exportNote, setExportNote] = useState<string | null>(null);

  async function onFile(event: Event) {
    const target = event.currentTarget as HTMLInputElement;
    const file = target.files?.[0];
    target.value = ''; // the same file can be picked again
    if (!file) return;
    setBusy('import');
    setExportNote(null);
    const r = await importFile(file, { strict });
    setReport(r);
    setBusy(null);
    if (r.status === 'imported') onImported?.(r);
  }

  async function runExport(kind: Exclude<ExchangeAction, 'import'>) {
    setBusy('export');
    setReport(null);
    setExportNote(null);
    try {
      const list = await (records ?? allSurveys)();
      const now = new Date();
      let file: File;
      let extra = '';
      if (kind === 'geojson') file = exportGeoJsonFile(list, now);
      else if (kind === 'csv') file = exportCsvFile(list, now);
      else {
        const z = await exportZipFile(list, true, now);
        file = z.file;
        extra = t('exchange.export.photos', {
          count: z.photosIncluded,
          missing: z.photosMissing.length,
        });
      }
      const outcome = await shareOrDownload(file, { title: t('exchange.export.shareTitle') });
      if (outcome !== 'cancelled' && kind !== 'csv')
        await markAsExported(list, now).catch(() => undefined);
      const unplaced = list.filter((r) => r.location === null).length;
      setExportNote(
        [
          t(
            outcome === 'shared'
              ? 'exchange.export.shared'
              : outcome === 'downloaded'
                ? 'exchange.export.downloaded'
                : 'exchange.export.cancelled',
            {
              count: list.length,
              file: file.name,
            },
          ),
          unplaced > 0 && kind !== 'csv' ? t('exchange.export.unplaced', { count: unplaced }) : '',
          extra,
        ]
          .filter(Boolean)
          .join(' '),
      );
    } catch (err) {
      setExportNote(
        t('exchange.export.failed', { detail: err instanceof Error ? err.message : String(err) }),
      );
    } finally {
      setBusy(null);
    }
  }

  return (
    <section class="gl-exchange" aria-label={t('exchange.title')}>
      {show.has('import') ? (
        <div class="gl-exchange__import">
          <button
            type="button"
            class="button button--wide"
            disabled={busy !== null}
            onClick={() => input.current?.click()}
          >
            {busy === 'import' ? t('exchange.import.busy') : t('exchange.import.button')}
          </button>
          <input
            ref={input}
            type="file"
            class="visually-hidden"
            tabIndex={-1}
            aria-hidden="true"
            accept=".geojson,.json,.zip,application/geo+json,application/json,application/zip"
            onChange={(e) => void onFile(e)}
            data-testid="import-file"
          />
          <label class="gl-check">
            <input
              type="checkbox"
              checked={strict}
              onChange={(e) => setStrict((e.currentTarget as HTMLInputElement).checked)}
            />
            <span>
              {t('exchange.import.strict')}
              <span class="gl-check__hint">{t('exchange.import.strictHint')}</span>
            </span>
          </label>
        </div>
      ) : null}
      <div class="gl-exchange__export">
        {show.has('geojson') ? (
          <button
            type="button"
            class="button"
            disabled={busy !== null}
            onClick={() => void runExport('geojson')}
          >
            {t('exchange.export.geojson')}
          </button>
        ) : null}
        {show.has('csv') ? (
          <button
            type="button"
            class="button"
            disabled={busy !== null}
            onClick={() => void runExport('csv')}
          >
            {t('exchange.export.csv')}
          </button>
        ) : null}
        {show.has('zip') ? (
          <button
            type="button"
            class="button"
            disabled={busy !== null}
            onClick={() => void runExport('zip')}
          >
            {t('exchange.export.zip')}
          </button>
        ) : null}
      </div>
      {busy === 'export' ? <p role="status">{t('exchange.export.busy')}</p> : null}
      {exportNote ? (
        <p role="status" class="gl-exchange__note">
          {exportNote}
        </p>
      ) : null}
      {report ? <ImportReportView report={report} /> : null}
      <p class="gl-exchange__caution muted">{t('exchange.caution.short')}</p>
    </section>
  );
}
