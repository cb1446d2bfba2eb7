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
  /** SVG path data on a 24 × 24 grid: drawn, not a font glyph, so every phone shows it. */
  icon: string;
  match: (path: string) => boolean;
}

const items: NavItem[] = [
  {
    href: paths.home,
    label: 'nav.buildings',
    icon: 'M3 11 12 4l9 7v9H3Zm4 3h4v6M14 14h3v3h-3z',
    match: (p) => p === '/' || p.startsWith('/survey'),
  },
  {
    href: paths.map,
    label: 'nav.map',
    icon: 'M3 6l6-2 6 2 6-2v14l-6 2-6-2-6 2ZM9 4v14M15 6v14',
    match: (p) => p.startsWith('/map'),
  },
  {
    href: paths.settings,
    label: 'nav.settings',
    icon: 'M4 7h10M18 7h2M4 17h2M10 17h10M14 4v6M6 14v6',
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
            <svg class="nav-bar__icon" viewBox="0 0 24 24" aria-hidden="true" focusable="false">
              <path d={item.icon} />
            </svg>
            <span>{t(item.label)}</span>
          </a>
        );
      })}
    </nav>
  );
}
