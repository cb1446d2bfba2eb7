/**
 * The map's clustering, asynchronously: in a worker where the browser can start one (the
 * page's CSP allows same-origin workers), otherwise on the main thread with the same
 * answers. Each `load` starts a new generation; answers for an older one are dropped, so a
 * quick series of filter changes never draws stale clusters.
 */
import { ClusterIndex, resolveItems, toColumns, type ClusterItem } from './cluster-index.js';
import type { ClusterReply, ClusterRequest } from './cluster-protocol.js';
import type { MapPoint } from './map-points.js';

type Pending = (reply: ClusterReply) => void;

export class ClusterClient {
  private worker: Worker | null = null;
  private local: ClusterIndex | null = null;
  private points: readonly MapPoint[] = [];
  private generation = 0;
  private nextId = 1;
  private readonly pending = new Map<number, Pending>();

  constructor(useWorker = typeof Worker !== 'undefined') {
    if (!useWorker) return;
    try {
      this.worker = new Worker(new URL('./cluster-worker.ts', import.meta.url), { type: 'module' });
      this.worker.onmessage = (e: MessageEvent<ClusterReply>) => {
        const done = this.pending.get(e.data.id);
        this.pending.delete(e.data.id);
        done?.(e.data);
      };
      this.worker.onerror = () => this.fallBack();
    } catch {
      this.worker = null;
    }
  }

  /** A worker that fails (blocked, crashed) is replaced by main-thread clustering. */
  private fallBack(): void {
    this.worker?.terminate();
    this.worker = null;
    for (const [id, done] of this.pending) done({ type: 'stale', id });
    this.pending.clear();
    if (this.points.length > 0) this.local = new ClusterIndex(toColumns(this.points));
  }

  private ask(message: ClusterRequest, transfer: Transferable[] = []): Promise<ClusterReply> {
    return new Promise((resolve) => {
      this.pending.set(message.id, resolve);
      this.worker?.postMessage(message, transfer);
    });
  }

  /** Clusters `points` (replacing the previous set). Resolves false when superseded. */
  async load(points: readonly MapPoint[]): Promise<boolean> {
    const generation = ++this.generation;
    this.points = points;
    if (!this.worker) {
      this.local = new ClusterIndex(toColumns(points));
      return true;
    }
    const columns = toColumns(points);
    const reply = await this.ask({ type: 'load', id: this.nextId++, generation, columns }, [
      columns.lon.buffer,
      columns.lat.buffer,
      columns.posting.buffer,
      columns.assessment.buffer,
    ]);
    if (reply.type === 'stale' && !this.worker && this.local) return generation === this.generation;
    return reply.type === 'loaded' && generation === this.generation;
  }

  /** Items to draw in a box at a zoom; null when the set changed meanwhile. */
  async itemsIn(
    bbox: [number, number, number, number],
    zoom: number,
  ): Promise<ClusterItem[] | null> {
    const generation = this.generation;
    const points = this.points;
    if (!this.worker) return this.local ? resolveItems(this.local.itemsIn(bbox, zoom), points) : [];
    const reply = await this.ask({ type: 'items', id: this.nextId++, generation, bbox, zoom });
    if (reply.type !== 'items' || generation !== this.generation) {
      if (!this.worker && this.local && generation === this.generation) {
        return resolveItems(this.local.itemsIn(bbox, zoom), points);
      }
      return null;
    }
    return resolveItems(reply.items, points);
  }

  /** The zoom at which a cluster falls apart; null when unknown. */
  async expansionZoom(clusterId: number): Promise<number | null> {
    if (!this.worker) return this.local ? this.local.expansionZoom(clusterId) : null;
    const reply = await this.ask({
      type: 'expansion',
      id: this.nextId++,
      generation: this.generation,
      clusterId,
    });
    return reply.type === 'expansion' ? reply.zoom : null;
  }

  dispose(): void {
    this.worker?.terminate();
    this.worker = null;
    this.pending.clear();
  }
}
