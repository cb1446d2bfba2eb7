import { describe, expect, it } from 'vitest';
import type { EvidenceItem, ScreeningResult } from '../../calc/index.js';
import { makeDemoTown } from '../../scripts/demo-town.js';
import { groupEvidence } from '../../web/screens/result/evidence-groups.js';

const records = makeDemoTown();
const resultOf = (address: string) => {
  const r = records.find((x) => x.address.startsWith(address));
  if (!r) throw new Error(`no demo building at ${address}`);
  return r.result?.result as unknown as ScreeningResult;
};

describe('groupEvidence', () => {
  it('shows the identical rocking walls of a demo CLT building as one item naming every wall', () => {
    const result = resultOf('13 Otterbank Road');
    const rocking = result.evidence.predicted.filter((e) => e.kind === 'rocking');
    expect(rocking.length).toBeGreaterThan(4);
    const groups = groupEvidence(result.evidence.predicted);
    const rockingGroups = groups.filter((g) => g.item.kind === 'rocking');
    expect(rockingGroups.length).toBeLessThan(rocking.length);
    // Nothing is lost: every item's place is in exactly one group.
    const places = groups.flatMap((g) => g.places);
    expect(places.sort()).toEqual(
      result.evidence.predicted
        .filter((e) => e.where !== null)
        .map((e) => e.where)
        .sort(),
    );
  });

  it('keeps items apart when their figures differ, even in one storey', () => {
    const base: EvidenceItem = resultOf('13 Otterbank Road').evidence.predicted.find(
      (e) => e.kind === 'rocking',
    )!;
    const id = base.where!.split(' ').pop()!;
    const other: EvidenceItem = {
      ...base,
      id: `${base.id}-b`,
      where: 'wall Q9',
      text: base.text.split(id).join('Q9'),
      valueText: '0.99',
    };
    expect(groupEvidence([base, other])).toHaveLength(2);
    const same: EvidenceItem = { ...other, valueText: base.valueText };
    expect(groupEvidence([base, same]).map((g) => g.places)).toEqual([[base.where, 'wall Q9']]);
  });

  it('never groups items that have no place', () => {
    const base = resultOf('13 Otterbank Road').evidence.predicted[0]!;
    const a = { ...base, id: 'a', where: null };
    const b = { ...base, id: 'b', where: null };
    expect(groupEvidence([a, b])).toHaveLength(2);
  });
});
