/**
 * The unit of work of a screen: unordered pairs first .. end - 1 (in the order of
 * unorderedPairAt), each tested both ways, written as records (pair-record.ts). A pure
 * function of its inputs, free of threads and I/O, so the single-thread screen, the Node
 * worker threads and a browser Web Worker all run this same code and get the same numbers:
 * a pair's answer depends only on its two series and the settings, never on the chunk.
 */
import { PairWorkspace } from './pair-relation';
import { RECORD_SIZE } from './pair-record';
import type { ScreenSettings } from './screen-options';
import { unorderedPairAt, unorderedPairCount, type ScreenUniverse } from './screen-universe';

/** Records for unordered pairs [first, end): 2 (end - first) directed pairs of RECORD_SIZE numbers. */
export function screenChunk(universe: ScreenUniverse, settings: ScreenSettings, first: number, end: number, workspace?: PairWorkspace): Float64Array {
  const out = new Float64Array(2 * (end - first) * RECORD_SIZE);
  screenChunkInto(universe, settings, first, end, out, 0, workspace);
  return out;
}

/** As screenChunk, writing into `out` from directed record `at` (for a shared result buffer). */
export function screenChunkInto(
  universe: ScreenUniverse, settings: ScreenSettings, first: number, end: number, out: Float64Array, at: number, workspace?: PairWorkspace,
): void {
  const N = universe.names.length;
  const total = unorderedPairCount(N);
  if (!(Number.isInteger(first) && Number.isInteger(end) && first >= 0 && first <= end && end <= total)) {
    throw new RangeError(`Pair range [${first}, ${end}) lies outside 0..${total}.`);
  }
  const work = workspace ?? new PairWorkspace(universe.rows);
  let [i, j] = first < end ? unorderedPairAt(first, N) : [0, 1];
  for (let k = first; k < end; k++) {
    work.testPair(universe, settings, i, j, out, at + 2 * (k - first));
    j++;
    if (j === N) {
      i++;
      j = i + 1;
    }
  }
}

/** Splits `total` unordered pairs into `chunks` contiguous ranges of nearly equal size. */
export function chunkRanges(total: number, chunks: number): [number, number][] {
  const count = Math.max(1, Math.min(chunks, total));
  const out: [number, number][] = [];
  for (let c = 0; c < count; c++) out.push([Math.floor((c * total) / count), Math.floor(((c + 1) * total) / count)]);
  return out;
}
