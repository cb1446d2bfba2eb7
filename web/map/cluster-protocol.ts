/** Messages between the map and its clustering worker (cluster-worker.ts). */
import type { ClusterColumns, RawItem } from './cluster-index.js';

export type ClusterRequest =
  | { type: 'load'; id: number; generation: number; columns: ClusterColumns }
  | {
      type: 'items';
      id: number;
      generation: number;
      bbox: [number, number, number, number];
      zoom: number;
    }
  | { type: 'expansion'; id: number; generation: number; clusterId: number };

export type ClusterReply =
  | { type: 'loaded'; id: number; generation: number }
  | { type: 'items'; id: number; items: RawItem[] }
  | { type: 'expansion'; id: number; zoom: number | null }
  | { type: 'stale'; id: number }
  | { type: 'error'; id: number; message: string };
