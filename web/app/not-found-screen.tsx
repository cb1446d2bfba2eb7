/** Shown for an address that is not an app route. */
import { t } from '../i18n/index.js';
import { paths } from './routes.js';

export function NotFoundScreen() {
  return (
    <main class="screen" id="main">
      <h1>{t('notFound.title')}</h1>
      <p>{t('notFound.body')}</p>
      <p>
        <a class="button button--primary" href={paths.home}>
          {t('notFound.home')}
        </a>
      </p>
    </main>
  );
}
