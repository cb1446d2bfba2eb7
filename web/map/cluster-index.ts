/**
 * Clustering of the map's points (supercluster, a KD-tree of points per zoom level). Each
 * cluster carries how many of its surveys are at each posting and how many need an
 * assessment, so a cluster's badge shows the worst news inside it, not just a count.
 *
 * Works on columns (typed arrays), so the same code runs in a worker (cluster-worker.ts),
 * which takes the clustering of 100 000 surveys off the page's main thread.
 */
import Supercluster from 'supercluster';
import type { MapPoint, PostingKey } from './map-points.js';

/** Counts carried by clusters. */
export interface ClusterCounts {
  keepOut: number;
  limited: number;
  open: number;
  unscreened: number;
  assessment: number;
}

/** What clustering needs of each point, column by column. */
export interface ClusterColumns {
  lon: Float64Array;
  lat: Float64Array;
  /** 0 keep-out, 1 limited, 2 open, 3 unscreened. */
  posting: Uint8Array;
  /** 1 when the survey needs an assessment. */
  assessment: Uint8Array;
}

const POSTING_CODE: Record<PostingKey, number> = {
  'keep-out': 0,
  limited: 1,
  open: 2,
  unscreened: 3,
};

export function toColumns(points: readonly MapPoint[]): ClusterColumns {
  const n = points.length;
  const c: ClusterColumns = {
    lon: new Float64Array(n),
    lat: new Float64Array(n),
    posting: new Uint8Array(n),
    assessment: new Uint8Array(n),
  };
  for (let i = 0; i < n; i++) {
    const p = points[i] as MapPoint;
    c.lon[i] = p.lon;
    c.lat[i] = p.lat;
    c.posting[i] = POSTING_CODE[p.posting];
    c.assessment[i] = p.needsAssessment ? 1 : 0;
  }
  return c;
}

/** One item to draw: a point (by index into the points) or a cluster. */
export type RawItem =
  | { kind: 'point'; index: number }
  | {
      kind: 'cluster';
      clusterId: number;
      count: number;
      counts: ClusterCounts;
      lat: number;
      lon: number;
    };

export type ClusterItem =
  | { kind: 'point'; point: MapPoint; lat: number; lon: number }
  | {
      kind: 'cluster';
      clusterId: number;
      count: number;
      counts: ClusterCounts;
      lat: number;
      lon: number;
    };

/** Pixel radius within which points merge. */
export const CLUSTER_RADIUS_PX = 64;
/**
 * Above zoom 16 (about 2 m per pixel) houses are tens of pixels apart and shown one by one;
 * each clustering level costs a pass over the points, so no deeper levels are built.
 * Common practice, no source.
 */
export const CLUSTER_MAX_ZOOM = 16;

interface Props extends Partial<ClusterCounts> {
  i: number;
}

export class ClusterIndex {
  private readonly index: Supercluster<Props, ClusterCounts>;

  constructor(columns: ClusterColumns) {
    const { lon, lat, posting, assessment } = columns;
    this.index = new Supercluster<Props, ClusterCounts>({
      radius: CLUSTER_RADIUS_PX,
      // Leaflet's zoom levels are 256-px tiles: with the same extent the radius is in
      // screen pixels (supercluster's default extent, 512, would halve it).
      extent: 256,
      minZoom: 2, // the map's own minimum zoom
      maxZoom: CLUSTER_MAX_ZOOM,
      map: (props) => {
        const code = posting[props.i] as number;
        return {
          keepOut: code === 0 ? 1 : 0,
          limited: code === 1 ? 1 : 0,
          open: code === 2 ? 1 : 0,
          unscreened: code === 3 ? 1 : 0,
          assessment: assessment[props.i] as number,
        };
      },
      reduce: (acc, props) => {
        acc.keepOut += props.keepOut;
        acc.limited += props.limited;
        acc.open += props.open;
        acc.unscreened += props.unscreened;
        acc.assessment += props.assessment;
      },
    });
    const features = new Array<Supercluster.PointFeature<Props>>(lon.length);
    for (let i = 0; i < lon.length; i++) {
      features[i] = {
        type: 'Feature',
        properties: { i },
        geometry: { type: 'Point', coordinates: [lon[i] as number, lat[i] as number] },
      };
    }
    this.index.load(features);
  }

  /** Clusters and single points in a box [west, south, east, north] at a zoom level. */
  itemsIn(bbox: [number, number, number, number], zoom: number): RawItem[] {
    return this.index.getClusters(bbox, Math.round(zoom)).map((f): RawItem => {
      const props = f.properties as Props & {
        cluster?: boolean;
        cluster_id?: number;
        point_count?: number;
      };
      if (!props.cluster) return { kind: 'point', index: props.i };
      const [lon, lat] = f.geometry.coordinates as [number, number];
      return {
        kind: 'cluster',
        clusterId: props.cluster_id as number,
        count: props.point_count as number,
        counts: {
          keepOut: props.keepOut ?? 0,
          limited: props.limited ?? 0,
          open: props.open ?? 0,
          unscreened: props.unscreened ?? 0,
          assessment: props.assessment ?? 0,
        },
        lat,
        lon,
      };
    });
  }

  /** The zoom at which a cluster falls apart into smaller ones. */
  expansionZoom(clusterId: number): number {
    return this.index.getClusterExpansionZoom(clusterId);
  }
}

/** Resolves raw items against the points they index. */
export function resolveItems(raw: readonly RawItem[], points: readonly MapPoint[]): ClusterItem[] {
  const out: ClusterItem[] = [];
  for (const r of raw) {
    if (r.kind === 'cluster') out.push(r);
    else {
      const p = points[r.index];
      if (p) out.push({ kind: 'point', point: p, lat: p.lat, lon: p.lon });
    }
  }
  return out;
}
