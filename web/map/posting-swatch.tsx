/** The posting symbol in its colours, as a preact component (chips, filters, card, lists). */
import { postingStyle } from './marker-style.js';
import type { PostingKey } from './map-points.js';
import { symbolShapes } from './posting-symbol.js';

export function PostingSymbol({ posting, size = 16 }: { posting: PostingKey; size?: number }) {
  return (
    <svg viewBox="0 0 20 20" width={size} height={size} aria-hidden="true" focusable="false">
      {symbolShapes(posting).map((s, i) => {
        const Tag = s.tag;
        return (
          <Tag key={i} {...s.attrs}>
            {s.text}
          </Tag>
        );
      })}
    </svg>
  );
}

export function PostingSwatch({ posting, size = 26 }: { posting: PostingKey; size?: number }) {
  const s = postingStyle(posting);
  return (
    <span
      class={`gl-swatch gl-swatch--${posting}`}
      aria-hidden="true"
      style={{
        backgroundColor: s.fill,
        borderColor: s.border,
        color: s.ink,
        width: `${size}px`,
        height: `${size}px`,
      }}
    >
      <PostingSymbol posting={posting} size={Math.round(size * 0.7)} />
    </span>
  );
}
