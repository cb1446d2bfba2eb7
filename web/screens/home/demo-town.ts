/**
 * "Load demo town": imports the invented demo town through web/exchange, loaded only when
 * asked for. The demo file is built separately; when this build has none, say so plainly
 * instead of pretending. Returns the sentence to show.
 */
import { t } from '../../i18n/index.js';

export async function loadDemoTown(): Promise<string> {
  let text: string;
  try {
    // The demo file is a build asset (web/demo), precached by the service worker.
    const { DEMO_TOWN_URL } = await import('../../demo/index.js');
    const response = await fetch(DEMO_TOWN_URL);
    const type = response.headers.get('content-type') ?? '';
    // An unknown path is answered with the app's HTML page: that is "not bundled".
    if (!response.ok || type.includes('text/html')) return t('home.demoUnavailable');
    text = await response.text();
  } catch {
    return t('home.demoUnavailable');
  }
  try {
    const { importDemoTown } = await import('../../exchange/index.js');
    const report = await importDemoTown({ text });
    if (report.status === 'imported') {
      return t('home.demoLoaded', { count: report.newSurveys + report.duplicates });
    }
    return t('home.demoFailed', { reason: 'reason' in report ? report.reason : report.status });
  } catch (e) {
    return t('home.demoFailed', { reason: String(e) });
  }
}
