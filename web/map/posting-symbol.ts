/**
 * The posting symbols drawn as small SVG shapes rather than characters, so they look the
 * same on every device: some fonts lack the characters, and some phones draw them as colour
 * emoji (a black square emoji would vanish on the keep-out fill). The shapes mirror the
 * symbols of posting-style.ts: hollow circle (open), half-filled circle (limited), solid
 * square (keep out), question mark (not screened). They use `currentColor`.
 */
import type { PostingKey } from './map-points.js';

export interface SymbolShape {
  tag: 'circle' | 'path' | 'rect' | 'text';
  attrs: Record<string, string>;
  text?: string;
}

/** The shapes of a symbol in a 20 × 20 box. */
export function symbolShapes(key: PostingKey): SymbolShape[] {
  switch (key) {
    case 'open':
      return [
        {
          tag: 'circle',
          attrs: {
            cx: '10',
            cy: '10',
            r: '6.5',
            fill: 'none',
            stroke: 'currentColor',
            'stroke-width': '2.6',
          },
        },
      ];
    case 'limited':
      return [
        {
          tag: 'circle',
          attrs: {
            cx: '10',
            cy: '10',
            r: '6.5',
            fill: 'none',
            stroke: 'currentColor',
            'stroke-width': '2.6',
          },
        },
        { tag: 'path', attrs: { d: 'M10 3.5 A6.5 6.5 0 0 0 10 16.5 Z', fill: 'currentColor' } },
      ];
    case 'keep-out':
      return [
        { tag: 'rect', attrs: { x: '4', y: '4', width: '12', height: '12', fill: 'currentColor' } },
      ];
    case 'unscreened':
      return [
        {
          tag: 'text',
          attrs: {
            x: '10',
            y: '15.5',
            'text-anchor': 'middle',
            'font-size': '15',
            'font-weight': '700',
            fill: 'currentColor',
            'font-family': 'sans-serif',
          },
          text: '?',
        },
      ];
  }
}

const SVG_NS = 'http://www.w3.org/2000/svg';

/** The symbol as an SVG element (for markers built outside preact). */
export function symbolSvg(key: PostingKey, sizePx: number): SVGSVGElement {
  const root = document.createElementNS(SVG_NS, 'svg');
  root.setAttribute('viewBox', '0 0 20 20');
  root.setAttribute('width', String(sizePx));
  root.setAttribute('height', String(sizePx));
  root.setAttribute('aria-hidden', 'true');
  root.setAttribute('focusable', 'false');
  for (const s of symbolShapes(key)) {
    const node = document.createElementNS(SVG_NS, s.tag);
    for (const [k, v] of Object.entries(s.attrs)) node.setAttribute(k, v);
    if (s.text !== undefined) node.textContent = s.text;
    root.append(node);
  }
  return root;
}
