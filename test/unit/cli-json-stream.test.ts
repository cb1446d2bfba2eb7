// The streaming splitter of the command line against JSON.parse (Node's own parser, the
// reference): for any JSON array or FeatureCollection cut into any chunks, the elements come
// out exactly as JSON.parse sees them. Property tests with fast-check.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { JsonArrayScanner, type JsonStreamEvent } from '../../cli/json-array-stream.js';

function scan(text: string | Buffer, cuts: number[] = [], options = {}): JsonStreamEvent[] {
  const bytes = typeof text === 'string' ? Buffer.from(text, 'utf8') : text;
  const scanner = new JsonArrayScanner(options);
  const events: JsonStreamEvent[] = [];
  let from = 0;
  for (const cut of [...cuts].sort((a, b) => a - b)) {
    const at = Math.min(bytes.length, Math.max(from, cut));
    events.push(...scanner.push(bytes.subarray(from, at)));
    from = at;
  }
  events.push(...scanner.push(bytes.subarray(from)));
  events.push(...scanner.end());
  return events;
}

const elements = (events: JsonStreamEvent[]) =>
  events
    .filter((e) => e.kind === 'element')
    .map((e) => JSON.parse((e as { text: string }).text) as unknown);

describe('JSON array scanner', () => {
  it('returns every element of any JSON array, however the bytes are cut (checked against JSON.parse)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.jsonValue(), { maxLength: 8 }),
        fc.array(fc.nat(), { maxLength: 6 }),
        fc.boolean(),
        (list, cuts, pretty) => {
          const text = JSON.stringify(list, null, pretty ? 2 : undefined);
          const events = scan(
            text,
            cuts.map((c) => c % (text.length + 1)),
          );
          expect(events.filter((e) => e.kind !== 'element')).toEqual([]);
          expect(elements(events)).toEqual(JSON.parse(text));
        },
      ),
      { numRuns: 300 },
    );
  });

  it('returns the features of a FeatureCollection and its other members, cut anywhere', () => {
    fc.assert(
      fc.property(
        fc.array(fc.jsonValue(), { maxLength: 5 }),
        fc.dictionary(
          fc.string({ maxLength: 6 }).filter((k) => k !== 'features'),
          fc.jsonValue(),
          {
            maxKeys: 3,
          },
        ),
        fc.array(fc.nat(), { maxLength: 6 }),
        (features, extra, cuts) => {
          const doc = { type: 'FeatureCollection', ...extra, features };
          const text = JSON.stringify(doc);
          const events = scan(
            text,
            cuts.map((c) => c % (text.length + 1)),
          );
          expect(events.filter((e) => e.kind === 'fatal' || e.kind === 'element-error')).toEqual(
            [],
          );
          // JSON has no negative zero: compare with what the text itself carries.
          expect(elements(events)).toEqual(JSON.parse(JSON.stringify(features)));
          const members = Object.fromEntries(
            events
              .filter((e) => e.kind === 'member')
              .map((e) => [(e as { key: string }).key, JSON.parse((e as { text: string }).text)]),
          );
          expect(members).toEqual(
            JSON.parse(JSON.stringify({ type: 'FeatureCollection', ...extra })),
          );
        },
      ),
      { numRuns: 300 },
    );
  });

  it('keeps multi-byte UTF-8 characters whole when a chunk boundary falls inside one', () => {
    const text = JSON.stringify([{ address: 'Grünweg 3, Øster Å — 東町' }, 'é']);
    const bytes = Buffer.from(text, 'utf8');
    for (let cut = 0; cut <= bytes.length; cut++) {
      expect(elements(scan(bytes, [cut]))).toEqual(JSON.parse(text));
    }
  });

  it('skips a UTF-8 byte order mark at the start', () => {
    const bytes = Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from('[1,2]')]);
    expect(elements(scan(bytes))).toEqual([1, 2]);
  });

  it('does not crash on an empty file: it reports it', () => {
    expect(scan('')).toEqual([{ kind: 'fatal', reason: 'the file is empty' }]);
    expect(scan('  \n ')).toEqual([{ kind: 'fatal', reason: 'the file is empty' }]);
  });

  it('does not crash on a file that is not JSON', () => {
    const events = scan('name,address\nA,1 Lane\n');
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ kind: 'fatal' });
  });

  it('reports a broken element by its index and goes on with the next ones', () => {
    const events = scan('[{"a":1},{"b":NaN},{"c":[1}],{"d":4}]');
    expect(events.map((e) => e.kind)).toEqual(['element', 'element', 'element-error', 'element']);
    // The NaN element is cut out whole; JSON.parse then refuses it (the reader reports it).
    expect(() => JSON.parse((events[1] as { text: string }).text)).toThrow();
    expect(events[2]).toMatchObject({ index: 2 });
    expect(events[3]).toMatchObject({ index: 3, text: '{"d":4}' });
  });

  it('skips an element larger than the limit and reports it, without keeping its bytes', () => {
    const big = `"${'x'.repeat(5000)}"`;
    const events = scan(`[1,${big},3]`, [100, 2000, 4000], { maxElementBytes: 1000 });
    expect(events.map((e) => e.kind)).toEqual(['element', 'element-error', 'element']);
    expect(events[2]).toMatchObject({ index: 2, text: '3' });
  });

  it('reports a file cut short, with the item it ended in', () => {
    const events = scan('[{"a":1},{"b":');
    expect(events.map((e) => e.kind)).toEqual(['element', 'element-error', 'fatal']);
    expect(events[1]).toMatchObject({ index: 1 });
  });

  it('refuses a trailing comma and text after the document', () => {
    expect(scan('[1,]').at(-1)).toMatchObject({ kind: 'fatal' });
    expect(scan('[1] x').at(-1)).toMatchObject({ kind: 'fatal' });
  });
});
