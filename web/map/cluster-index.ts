/**
 * Clustering of the map's points (supercluster, a KD-tree of points per zoom level). Each
 * cluster carries how many of its surveys are at each posting and how many need an
 * assessment, so a cluster's badge shows the worst news inside it, not just a count.
 */
import Supercluster from 'supercluster';
import type { MapPoint, PostingKey } from './map-points.js';

export interface PointProps {
  /** Index into the points array. */
  i: number;
}

/** Counts carried by clusters. */
export interface ClusterCounts {
  keepOut: number;
  limited: number;
  open: number;
  unscreened: number;
  assessment: number;
}

type Props = PointProps & Partial<ClusterCounts>;

const countsFor = (posting: PostingKey, needsAssessment: boolean): ClusterCounts => ({
  keepOut: posting === 'keep-out' ? 1 : 0,
  limited: posting === 'limited' ? 1 : 0,
  open: posting === 'open' ? 1 : 0,
  unscreened: posting === 'unscreened' ? 1 : 0,
  assessment: needsAssessment ? 1 : 0,
});

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

/** Pixel radius within which points merge, and the zoom above which they never do. */
export const CLUSTER_RADIUS_PX = 64;
export const CLUSTER_MAX_ZOOM = 17;

export class ClusterIndex {
  private readonly index: Supercluster<PointProps, ClusterCounts>;
  private readonly points: readonly MapPoint[];

  constructor(points: readonly MapPoint[]) {
    this.points = points;
    this.index = new Supercluster<PointProps, ClusterCounts>({
      radius: CLUSTER_RADIUS_PX,
      // Leaflet's zoom levels are 256-px tiles: with the same extent the radius is in
      // screen pixels (supercluster's default extent, 512, would halve it).
      extent: 256,
      maxZoom: CLUSTER_MAX_ZOOM,
      map: (props) => {
        const p = points[props.i] as MapPoint;
        return countsFor(p.posting, p.needsAssessment);
      },
      reduce: (acc, props) => {
        acc.keepOut += props.keepOut;
        acc.limited += props.limited;
        acc.open += props.open;
        acc.unscreened += props.unscreened;
        acc.assessment += props.assessment;
      },
    });
    this.index.load(
      points.map((p, i) => ({
        type: 'Feature' as const,
        properties: { i },
        geometry: { type: 'Point' as const, coordinates: [p.lon, p.lat] },
      })),
    );
  }

  /** Clusters and single points in a box [west, south, east, north] at a zoom level. */
  itemsIn(bbox: [number, number, number, number], zoom: number): ClusterItem[] {
    return this.index.getClusters(bbox, Math.round(zoom)).map((f) => {
      const [lon, lat] = f.geometry.coordinates as [number, number];
      const props = f.properties as Props & {
        cluster?: boolean;
        cluster_id?: number;
        point_count?: number;
      };
      if (props.cluster) {
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
      }
      return { kind: 'point', point: this.points[props.i] as MapPoint, lat, lon };
    });
  }

  /** The zoom at which a cluster falls apart into smaller ones. */
  expansionZoom(clusterId: number): number {
    return this.index.getClusterExpansionZoom(clusterId);
  }
}
