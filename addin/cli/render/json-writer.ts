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

  /** The text of a value that is not an array or object, or undefined for those. */
  const primitive = (v: unknown): string | undefined => {
    if (v === null) return 'null';
    if (typeof v === 'number') return Number.isFinite(v) ? String(v) : 'null';
    if (typeof v === 'boolean') return v ? 'true' : 'false';
    if (typeof v === 'string') return JSON.stringify(v);
    if (typeof v === 'bigint') throw new TypeError('Do not know how to serialize a BigInt');
    if (v instanceof Number || v instanceof String || v instanceof Boolean) return JSON.stringify(v);
    return undefined;
  };

  /** True for what primitive() writes (without writing it). */
  const isPrimitive = (v: unknown): boolean => {
    if (typeof v === 'bigint') throw new TypeError('Do not know how to serialize a BigInt');
    return v === null || typeof v !== 'object' || v instanceof Number || v instanceof String || v instanceof Boolean;
  };

  const emit = (v: unknown, stepIn: string): void => {
    const text = primitive(v);
    if (text !== undefined) return put(text);
    if (open.has(v)) throw new TypeError('Converting circular structure to JSON');
    open.add(v);
    emitContainer(v as object, stepIn);
    open.delete(v);
  };

  const emitContainer = (v: object, stepIn: string): void => {
    const inner = stepIn + gap;
    if (Array.isArray(v)) {
      if (v.length === 0) return put('[]');
      put(gap ? '[\n' + inner : '[');
      // The items that are not arrays or objects are written in batches of 512 by JSON.stringify
      // itself, whose number-to-text leaves no garbage behind: String(number) item by item left
      // some 300 MB for the old generation on a million-row report. Raw line breaks occur in
      // JSON text only between items (strings escape theirs), so re-indenting a batch is one
      // replacement of its separators.
      const separator = gap ? ',\n' + inner : ',';
      const batch: unknown[] = [];
      let started = false;
      const flush = (): void => {
        if (batch.length === 0) return;
        let text: string;
        if (gap) {
          const whole = JSON.stringify(batch, null, gap);
          text = whole.slice(2 + gap.length, whole.length - 2).replaceAll(',\n' + gap, separator);
        } else {
          text = JSON.stringify(batch).slice(1, -1);
        }
        put(started ? separator + text : text);
        started = true;
        batch.length = 0;
      };
      for (let i = 0; i < v.length; i++) {
        const item = prepared(v, String(i), v[i]);
        if (omitted(item)) batch.push(null);
        else if (isPrimitive(item)) batch.push(item);
        else {
          flush();
          if (started) put(separator);
          started = true;
          emit(item, inner);
          continue;
        }
        if (batch.length >= 512) flush();
      }
      flush();
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
