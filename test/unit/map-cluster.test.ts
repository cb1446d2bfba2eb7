/**
 * Clusters (supercluster): every survey is in exactly one cluster or shown alone at every
 * zoom, and the posting counts a cluster carries add up to the surveys inside it.
 */
import { describe, expect, it } from 'vitest';
import { ClusterClient } from '../../web/map/cluster-client.js';
import { ClusterIndex, resolveItems, toColumns } from '../../web/map/cluster-index.js';
import { toMapData } from '../../web/map/map-points.js';
import { makeTown } from '../fixtures/exchange/town.js';

describe('map clusters', () => {
  const { points } = toMapData(makeTown(2000, { seed: 9 }));
  const index = new ClusterIndex(toColumns(points));
  const itemsAt = (zoom: number) => resolveItems(index.itemsIn(world, zoom), points);
  const world: [number, number, number, number] = [-180, -85, 180, 85];

  it('accounts for every survey once at every zoom, with counts that add up', () => {
    const expected = {
      keepOut: points.filter((p) => p.posting === 'keep-out').length,
      limited: points.filter((p) => p.posting === 'limited').length,
      open: points.filter((p) => p.posting === 'open').length,
      unscreened: points.filter((p) => p.posting === 'unscreened').length,
      assessment: points.filter((p) => p.needsAssessment).length,
    };
    for (let zoom = 2; zoom <= 18; zoom++) {
      const items = itemsAt(zoom);
      const total = { keepOut: 0, limited: 0, open: 0, unscreened: 0, assessment: 0, count: 0 };
      for (const item of items) {
        if (item.kind === 'cluster') {
          total.count += item.count;
          const c = item.counts;
          expect(c.keepOut + c.limited + c.open + c.unscreened).toBe(item.count);
          total.keepOut += c.keepOut;
          total.limited += c.limited;
          total.open += c.open;
          total.unscreened += c.unscreened;
          total.assessment += c.assessment;
        } else {
          total.count += 1;
          const p = item.point;
          if (p.posting === 'keep-out') total.keepOut += 1;
          if (p.posting === 'limited') total.limited += 1;
          if (p.posting === 'open') total.open += 1;
          if (p.posting === 'unscreened') total.unscreened += 1;
          if (p.needsAssessment) total.assessment += 1;
        }
      }
      expect(total).toEqual({ ...expected, count: points.length });
    }
  });

  it('shows single buildings once zoomed in past the clustering levels', () => {
    const items = itemsAt(19);
    expect(items.every((i) => i.kind === 'point')).toBe(true);
    expect(items).toHaveLength(points.length);
  });

  it('answers the same through the asynchronous client (main-thread fallback here)', async () => {
    const client = new ClusterClient(false);
    expect(await client.load(points)).toBe(true);
    expect(await client.itemsIn(world, 12)).toEqual(itemsAt(12));
    const cluster = itemsAt(10).find((i) => i.kind === 'cluster');
    if (cluster?.kind !== 'cluster') throw new Error('expected a cluster');
    expect(await client.expansionZoom(cluster.clusterId)).toBe(
      index.expansionZoom(cluster.clusterId),
    );
    client.dispose();
  });

  it('groups a town into a few clusters when zoomed out', () => {
    const items = itemsAt(10);
    expect(items.length).toBeLessThan(10);
    const first = items.find((i) => i.kind === 'cluster');
    expect(
      first && first.kind === 'cluster' && index.expansionZoom(first.clusterId),
    ).toBeGreaterThan(10);
  });
});
