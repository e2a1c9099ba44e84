/**
 * Refusing up front a screen this machine cannot hold, with what would fit, instead of dying
 * out of memory after minutes. What a screen keeps (screen-tally.ts): the p-value of every
 * directed pair tested and its adjusted value (24 bytes a pair at most, growth included), the
 * series (three copies: as read, packed, and shared with the threads), one batch of records
 * (16 MB) and the best pairs asked for (about 1 KB each on the JavaScript heap). A stream of
 * every pair goes through a temporary file of 208 bytes a pair, which must fit on the disk.
 * A part (--part k/n) keeps no p-values: its records go straight to its file.
 */
import { statfsSync } from 'node:fs';
import { totalmem } from 'node:os';
import { getHeapStatistics } from 'node:v8';
import { MooringInputError } from '../errors';

/** What the machine offers. */
export interface MachineMemory {
  /** Memory a screen may use: 80% of the machine's. */
  bytes: number;
  /** The JavaScript heap's limit. */
  heapBytes: number;
}

/** This machine. */
export function thisMachine(): MachineMemory {
  return { bytes: 0.8 * totalmem(), heapBytes: getHeapStatistics().heap_size_limit };
}

const BASE_BYTES = 150 * 2 ** 20;
const BATCH_BYTES = 24 * 2 ** 20;
const P_VALUE_BYTES = 24;
const KEPT_PAIR_BYTES = 1024;

/** Bytes a screen of `series` series of `rows` rows needs (see the file comment); `part` keeps no p-values. */
export function screenBytes(series: number, rows: number, part: boolean): number {
  const directed = series * (series - 1);
  return BASE_BYTES + BATCH_BYTES + 3 * 8 * series * rows + (part ? 0 : P_VALUE_BYTES * directed);
}

function gigabytes(bytes: number): string {
  return bytes >= 2 ** 30 ? `${(bytes / 2 ** 30).toFixed(1)} GB` : `${Math.ceil(bytes / 2 ** 20)} MB`;
}

/** Refuses, with what would fit, a screen (or a merge of one) this machine cannot hold. */
export function requireScreenMemory(
  screen: { series: number; rows: number; top: number; part?: boolean; merge?: boolean }, machine: MachineMemory = thisMachine(),
): void {
  const { series, rows, top } = screen;
  const part = screen.part === true;
  const need = screenBytes(series, rows, part);
  const directed = series * (series - 1);
  if (need > machine.bytes) {
    let fit = series;
    while (fit > 2 && screenBytes(fit, rows, part) > machine.bytes) fit = Math.floor(fit * 0.97);
    const what = part
      ? `its ${series.toLocaleString('en-US')} series of ${rows.toLocaleString('en-US')} rows need about ${gigabytes(need)}`
      : `its ${directed.toLocaleString('en-US')} directed pairs need about ${gigabytes(need)} for one p-value each (the false-discovery adjustment needs them all)`;
    const split = screen.merge
      ? `merge the parts on a machine with about ${gigabytes(need / 0.8)} of memory`
      : part
        ? 'use fewer rows (--from/--to) or a machine with more memory'
        : `split the pairs with --part k/n (a part keeps no p-values) and combine the parts with mooring merge on a machine with about ${gigabytes(need / 0.8)}`;
    throw new MooringInputError(
      `A ${screen.merge ? 'merge' : 'screen'} of ${series.toLocaleString('en-US')} series is more than this machine can hold: ${what}, and it has about ${gigabytes(machine.bytes)} to give. ` +
        `About ${fit.toLocaleString('en-US')} series would fit here; or ${split}.`,
    );
  }
  const kept = Math.min(top, directed);
  if (!part && kept * KEPT_PAIR_BYTES > 0.5 * machine.heapBytes) {
    const most = Math.floor((0.5 * machine.heapBytes) / KEPT_PAIR_BYTES);
    throw new MooringInputError(
      `--top ${top.toLocaleString('en-US')} would keep about ${gigabytes(kept * KEPT_PAIR_BYTES)} of pairs in memory, more than this process can hold: ` +
        `ask for at most ${most.toLocaleString('en-US')}, or list every pair with --format jsonl or csv, which writes them as it goes.`,
    );
  }
}

/** Refuses a file of `bytes` bytes in `folder` when its disk has less room free. */
export function requireDiskRoom(folder: string, bytes: number, what: string): void {
  let free: number;
  try {
    const s = statfsSync(folder);
    free = s.bavail * s.bsize;
  } catch {
    return; // the write itself will say what went wrong
  }
  if (bytes > free) {
    throw new MooringInputError(`${what} needs about ${gigabytes(bytes)} in ${folder}, which has ${gigabytes(free)} free: free some room, or set TMPDIR to a folder on a larger disk.`);
  }
}
