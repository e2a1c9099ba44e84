import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { writeJson } from '../../addin/cli/render/json-writer';

/**
 * The piecewise JSON writer must give exactly JSON.stringify's text (the JavaScript engine's
 * own serializer is the reference, ECMA-262 SerializeJSONProperty).
 */
function written(value: unknown, replacer: (this: unknown, key: string, v: unknown) => unknown, indent: number): { text: string; pieces: string[] } {
  const pieces: string[] = [];
  writeJson(value, replacer, indent, (s) => pieces.push(s));
  return { text: pieces.join(''), pieces };
}

const identity = function (this: unknown, _key: string, v: unknown): unknown {
  return v;
};

/** The command line's replacer: typed arrays as arrays, non-finite numbers as null. */
function asJson(_key: string, value: unknown): unknown {
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) return Array.from(value as unknown as ArrayLike<number>);
  if (typeof value === 'number' && !Number.isFinite(value)) return null;
  return value;
}

describe('piecewise JSON writer', () => {
  it('gives JSON.stringify\'s text for any value fast-check makes, indented by 2 and not indented (seed 13, 300 runs)', () => {
    fc.assert(
      fc.property(fc.anything({ withBigInt: false, withDate: true, withTypedArray: true, withSparseArray: true, withNullPrototype: true, withObjectString: true, withBoxedValues: true, withMap: true, withSet: true }), (value) => {
        for (const indent of [0, 2]) {
          // Where JSON.stringify answers undefined (nothing to write), the writer writes nothing.
          expect(written(value, identity, indent).text).toBe(JSON.stringify(value, identity, indent) ?? '');
          expect(written(value, asJson, indent).text).toBe(JSON.stringify(value, asJson, indent) ?? '');
        }
      }),
      { seed: 13, numRuns: 300 },
    );
  });

  it('writes a report-sized typed array in many pieces, none cutting a surrogate pair, and the same text', () => {
    const values = Float64Array.from({ length: 50_000 }, (_, i) => (i % 97 === 0 ? Number.NaN : Math.sin(i) * 1e3));
    const value = { name: 'Kai \ud83d\ude80 \u202e', rows: values, labels: Array.from({ length: 5000 }, (_, i) => `\ud83d\ude80 row ${i}`), missing: undefined, f: () => 1 };
    const { text, pieces } = written(value, asJson, 2);
    expect(text).toBe(JSON.stringify(value, asJson, 2));
    expect(pieces.length).toBeGreaterThan(10);
    for (const p of pieces) {
      const last = p.charCodeAt(p.length - 1);
      expect(last >= 0xd800 && last <= 0xdbff).toBe(false);
    }
  });

  it('refuses a cycle as JSON.stringify does', () => {
    const a: Record<string, unknown> = { b: 1 };
    a.self = a;
    expect(() => written(a, identity, 2)).toThrow(TypeError);
  });
});
