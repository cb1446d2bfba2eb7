/**
 * A worker that clusters the map's points (cluster-index.ts) off the page's main thread,
 * so the map stays responsive while 100 000 surveys are clustered (at opening, and at every
 * filter change). Messages: cluster-protocol.ts.
 */
import { ClusterIndex } from './cluster-index.js';
import type { ClusterReply, ClusterRequest } from './cluster-protocol.js';

interface WorkerScope {
  onmessage: ((event: MessageEvent<ClusterRequest>) => void) | null;
  postMessage(message: ClusterReply): void;
}

const scope = self as unknown as WorkerScope;
let index: ClusterIndex | null = null;
let generation = -1;

scope.onmessage = (event) => {
  const m = event.data;
  try {
    if (m.type === 'load') {
      index = new ClusterIndex(m.columns);
      generation = m.generation;
      scope.postMessage({ type: 'loaded', id: m.id, generation });
    } else if (m.type === 'items') {
      if (!index || m.generation !== generation) {
        scope.postMessage({ type: 'stale', id: m.id });
        return;
      }
      scope.postMessage({ type: 'items', id: m.id, items: index.itemsIn(m.bbox, m.zoom) });
    } else if (m.type === 'expansion') {
      const zoom = index && m.generation === generation ? index.expansionZoom(m.clusterId) : null;
      scope.postMessage({ type: 'expansion', id: m.id, zoom });
    }
  } catch (err) {
    scope.postMessage({
      type: 'error',
      id: m.id,
      message: err instanceof Error ? err.message : String(err),
    });
  }
};
