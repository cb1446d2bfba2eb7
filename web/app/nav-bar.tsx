/**
 * Bottom navigation, in thumb reach on a phone held in one hand. Large targets, icon + word,
 * and the current screen marked with aria-current (not by colour alone).
 */
import { useLocation } from 'preact-iso';
import { t, type MessageKey } from '../i18n/index.js';
import { paths } from './routes.js';

interface NavItem {
  href: string;
  label: MessageKey;
  icon: string;
  match: (path: string) => boolean;
}

const items: NavItem[] = [
  { href: paths.home, label: 'nav.buildings', icon: '▤', match: (p) => p === '/' },
  { href: paths.map, label: 'nav.map', icon: '⌖', match: (p) => p.startsWith('/map') },
  {
    href: paths.settings,
    label: 'nav.settings',
    icon: '⚙',
    match: (p) => p.startsWith('/settings'),
  },
];

export function NavBar() {
  const { path } = useLocation();
  return (
    <nav class="nav-bar" aria-label={t('nav.label')}>
      {items.map((item) => {
        const current = item.match(path);
        return (
          <a
            key={item.href}
            href={item.href}
            class="nav-bar__item"
            aria-current={current ? 'page' : undefined}
          >
            <span class="nav-bar__icon" aria-hidden="true">
              {item.icon}
            </span>
            <span>{t(item.label)}</span>
          </a>
        );
      })}
    </nav>
  );
}
