/**
 * The DOM of map markers and cluster badges, built from elements and text nodes only
 * (imported text never becomes markup). Styling is by class (web/styles/map.css); the only
 * inline styles are colours and sizes set through the CSSOM, which the page's Content
 * Security Policy allows.
 */
import { t } from '../i18n/index.js';
import type { ClusterCounts } from './cluster-index.js';
import type { MapPoint } from './map-points.js';
import { damageLabel, damageTag, postingStyle } from './marker-style.js';
import { symbolSvg } from './posting-symbol.js';

function el<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  className: string,
  text?: string,
): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  node.className = className;
  if (text !== undefined) node.textContent = text;
  return node;
}

/** The accessible name of a marker: address, posting, damage state, flags. */
export function markerLabel(point: MapPoint): string {
  const parts = [
    point.address.trim() || t('map.card.noAddress'),
    t(postingStyle(point.posting).label),
    t('map.card.damage', { state: t(damageLabel(point.damage)) }),
  ];
  if (point.needsAssessment) parts.push(t('map.flag.assessment'));
  if (point.conflict) parts.push(t('map.flag.conflict'));
  return parts.join(' · ');
}

/** A single survey: symbol badge with the posting's colours, damage tag, flags, word. */
export function markerElement(point: MapPoint, selected: boolean): HTMLElement {
  const style = postingStyle(point.posting);
  const root = el('span', `gl-marker gl-marker--${point.posting}${selected ? ' is-selected' : ''}`);
  const badge = el('span', 'gl-marker__badge');
  badge.style.backgroundColor = style.fill;
  badge.style.borderColor = style.border;
  badge.style.color = style.ink;
  badge.append(symbolSvg(point.posting, 18));
  root.append(badge);
  const tag = damageTag(point.damage);
  if (tag) root.append(el('span', 'gl-marker__damage', tag));
  if (point.needsAssessment) root.append(el('span', 'gl-marker__flag', '!'));
  if (point.conflict) root.append(el('span', 'gl-marker__conflict', '⇄'));
  root.append(el('span', 'gl-marker__word', t(style.label)));
  return root;
}

/** Diameter of a cluster badge for its count, in px (at least a 44 px tap target). */
export function clusterSize(count: number): number {
  return Math.round(Math.min(64, 44 + 6 * Math.log10(Math.max(1, count))));
}

/** A cluster: count in the middle, a ring split by posting share, the keep-out count. */
export function clusterElement(count: number, counts: ClusterCounts): HTMLElement {
  const size = clusterSize(count);
  const root = el('span', 'gl-cluster');
  root.style.width = `${size}px`;
  root.style.height = `${size}px`;
  // Ring: conic gradient by posting, worst first from 12 o'clock, in the posting colours.
  const order: Array<[keyof ClusterCounts, string]> = [
    ['keepOut', postingStyle('keep-out').fill],
    ['limited', postingStyle('limited').border],
    ['open', postingStyle('open').border],
    ['unscreened', postingStyle('unscreened').border],
  ];
  const stops: string[] = [];
  let at = 0;
  for (const [key, colour] of order) {
    const share = counts[key] / Math.max(1, count);
    if (share <= 0) continue;
    stops.push(`${colour} ${(at * 360).toFixed(1)}deg ${((at + share) * 360).toFixed(1)}deg`);
    at += share;
  }
  root.style.background = `conic-gradient(${stops.join(', ')})`;
  const inner = el(
    'span',
    'gl-cluster__count',
    count >= 10_000 ? `${Math.round(count / 1000)}k` : String(count),
  );
  root.append(inner);
  if (counts.keepOut > 0) {
    const chip = el('span', 'gl-cluster__keepout');
    chip.append(symbolSvg('keep-out', 12), document.createTextNode(String(counts.keepOut)));
    root.append(chip);
  }
  return root;
}

/** The accessible name of a cluster. */
export function clusterLabel(count: number, counts: ClusterCounts): string {
  return t('map.cluster.label', {
    count,
    keepOut: counts.keepOut,
    limited: counts.limited,
    open: counts.open,
    unscreened: counts.unscreened,
    assessment: counts.assessment,
  });
}
