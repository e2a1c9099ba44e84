/**
 * JSON text written in pieces: the same characters JSON.stringify(value, replacer, indent)
 * returns, handed to `write` about CHUNK characters at a time instead of as one string. A
 * report on a million rows carries a dozen per-row arrays, about 350 MB of text; held whole, then
 * copied for the write, that text alone took over a gigabyte.
 *
 * Follows JSON.stringify's steps (ECMA-262, SerializeJSONProperty): toJSON first, then the
 * replacer with the holder as `this`; undefined, functions and symbols are left out of objects
 * and written as null in arrays; numbers that are not finite are null; strings are quoted by
 * JSON.stringify itself. A piece is never cut inside a string, so a chunk never splits a
 * surrogate pair. Tested equal to JSON.stringify (tests/cli/json-writer.test.ts).
 */

/** Characters gathered before each write. */
const CHUNK = 1 << 16;

type Replacer = (this: unknown, key: string, value: unknown) => unknown;

export function writeJson(value: unknown, replacer: Replacer, indent: number, write: (text: string) => void): void {
  const gap = ' '.repeat(indent);
  let buffer = '';
  const put = (s: string): void => {
    buffer += s;
    if (buffer.length >= CHUNK) {
      write(buffer);
      buffer = '';
    }
  };

  /** The value as JSON.stringify would see it for this key: after toJSON and the replacer. */
  const prepared = (holder: unknown, key: string, v: unknown): unknown => {
    if (v !== null && (typeof v === 'object' || typeof v === 'bigint') && typeof (v as { toJSON?: unknown }).toJSON === 'function') {
      v = (v as { toJSON: (k: string) => unknown }).toJSON(key);
    }
    return replacer.call(holder, key, v);
  };

  const omitted = (v: unknown): boolean => v === undefined || typeof v === 'function' || typeof v === 'symbol';
  const open = new Set<unknown>(); // the arrays and objects being written, to refuse a cycle as JSON.stringify does

  const emit = (v: unknown, stepIn: string): void => {
    if (v === null) return put('null');
    if (typeof v === 'number') return put(Number.isFinite(v) ? String(v) : 'null');
    if (typeof v === 'boolean') return put(v ? 'true' : 'false');
    if (typeof v === 'string') return put(JSON.stringify(v));
    if (typeof v === 'bigint') throw new TypeError('Do not know how to serialize a BigInt');
    if (v instanceof Number || v instanceof String || v instanceof Boolean) return put(JSON.stringify(v));
    if (open.has(v)) throw new TypeError('Converting circular structure to JSON');
    open.add(v);
    emitContainer(v, stepIn);
    open.delete(v);
  };

  const emitContainer = (v: object, stepIn: string): void => {
    const inner = stepIn + gap;
    if (Array.isArray(v)) {
      if (v.length === 0) return put('[]');
      put(gap ? '[\n' + inner : '[');
      for (let i = 0; i < v.length; i++) {
        if (i > 0) put(gap ? ',\n' + inner : ',');
        const item = prepared(v, String(i), v[i]);
        if (omitted(item)) put('null');
        else emit(item, inner);
      }
      put(gap ? '\n' + stepIn + ']' : ']');
      return;
    }
    const object = v as Record<string, unknown>;
    let first = true;
    for (const key of Object.keys(object)) {
      const item = prepared(object, key, object[key]);
      if (omitted(item)) continue;
      put(first ? (gap ? '{\n' + inner : '{') : gap ? ',\n' + inner : ',');
      first = false;
      put(JSON.stringify(key) + (gap ? ': ' : ':'));
      emit(item, inner);
    }
    put(first ? '{}' : gap ? '\n' + stepIn + '}' : '}');
  };

  const top = prepared({ '': value }, '', value);
  if (!omitted(top)) emit(top, '');
  if (buffer.length > 0) write(buffer);
}
