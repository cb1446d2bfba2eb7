/**
 * A Leaflet layer that draws a latitude/longitude grid with labels, in SVG, in its own pane
 * between the tiles and the markers. With no tiles at all (no network, no offline basemap)
 * it is what gives the map its bearings, together with the scale bar.
 *
 * Redrawn on every move (throttled to one frame); line positions come from grid-lines.ts.
 */
import * as L from 'leaflet';
import { gridFor } from './grid-lines.js';

const SVG = 'http://www.w3.org/2000/svg';

function svg<K extends keyof SVGElementTagNameMap>(tag: K, attrs: Record<string, string | number>) {
  const node = document.createElementNS(SVG, tag);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, String(v));
  return node;
}

export class CoordinateGrid extends L.Layer {
  private root: SVGSVGElement | null = null;
  private frame = 0;
  private readonly redraw = () => {
    if (this.frame) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = 0;
      this.draw();
    });
  };

  override onAdd(map: L.Map): this {
    const pane = map.getPane('grainline-grid') ?? map.createPane('grainline-grid');
    pane.classList.add('gl-grid-pane');
    this.root = svg('svg', { class: 'gl-grid', 'aria-hidden': 'true' });
    pane.append(this.root);
    map.on('move zoomend viewreset resize', this.redraw);
    this.draw();
    return this;
  }

  override onRemove(map: L.Map): this {
    map.off('move zoomend viewreset resize', this.redraw);
    if (this.frame) cancelAnimationFrame(this.frame);
    this.frame = 0;
    this.root?.remove();
    this.root = null;
    return this;
  }

  private draw(): void {
    const map = this._map as L.Map | undefined;
    const root = this.root;
    if (!map || !root) return;
    const size = map.getSize();
    const bounds = map.getBounds();
    // The pane moves with the map; place the drawing over the current view.
    L.DomUtil.setPosition(root as unknown as HTMLElement, map.containerPointToLayerPoint([0, 0]));
    root.setAttribute('width', String(size.x));
    root.setAttribute('height', String(size.y));
    root.replaceChildren();
    const grid = gridFor({
      south: bounds.getSouth(),
      west: bounds.getWest(),
      north: bounds.getNorth(),
      east: bounds.getEast(),
      widthPx: size.x,
      heightPx: size.y,
    });
    const lines = svg('g', { class: 'gl-grid__lines' });
    const labels = svg('g', { class: 'gl-grid__labels' });
    const centreLat = bounds.getCenter().lat;
    for (const m of grid.meridians) {
      const x = map.latLngToContainerPoint([centreLat, m.value]).x;
      lines.append(svg('line', { x1: x, y1: 0, x2: x, y2: size.y }));
      const label = svg('text', { x: x + 4, y: 16 });
      label.textContent = m.label;
      labels.append(label);
    }
    const centreLon = bounds.getCenter().lng;
    for (const p of grid.parallels) {
      const y = map.latLngToContainerPoint([p.value, centreLon]).y;
      lines.append(svg('line', { x1: 0, y1: y, x2: size.x, y2: y }));
      const label = svg('text', { x: 4, y: y - 4 });
      label.textContent = p.label;
      labels.append(label);
    }
    root.append(lines, labels);
  }
}
