/**
 * Raw screen results on disk: the records of a run of unordered pairs (pair-record.ts, 13
 * float64 numbers per directed pair) behind a header that says which universe, settings and
 * pairs they belong to. `mooring screen --part k/n --out FILE` writes one; `mooring merge`
 * reads them all back; a one-machine screen that streams every pair writes the whole universe
 * as one part in a temporary folder and reads it back the same way, so the two paths share
 * every line of the output code.
 *
 * Layout: 8 bytes "MOORSCRN", a little-endian uint32 format version, a uint32 header length,
 * the header as UTF-8 JSON padded with spaces to a multiple of 8 bytes, then the records as
 * little-endian float64 (the byte order of x64 and arm64, which the reader checks for).
 * The fingerprint is a SHA-256 of the series as screened, their orders and the settings: parts
 * of different data or settings cannot be merged by mistake.
 */
import { createHash } from 'node:crypto';
import { closeSync, fstatSync, openSync, readSync, writeSync } from 'node:fs';
import { MooringInputError } from '../errors';
import { RECORD_SIZE } from '../screen/pair-record';
import type { ScreenSettings } from '../screen/screen-options';
import { unorderedPairCount, type ScreenUniverse } from '../screen/screen-universe';
import type { SeriesOrder } from '../screen/series-orders';

const MAGIC = 'MOORSCRN';
const VERSION = 1;
const RECORD_BYTES = 2 * RECORD_SIZE * 8;

/** What the output needs of the input file, carried by every part so that merge needs no CSV. */
export interface ScreenSource {
  /** The file name(s) as given to screen. */
  file: string;
  leftOut: string[];
  /** What was done to the rows before the screen, in words. */
  notices: string[];
  halfLifeUnit: string;
  spacing: string;
  /** The file's line number of each row, and its date text (null without dates). */
  lines: number[];
  dates: (string | null)[] | null;
}

/** The header of a part file. */
export interface PartHeader {
  format: 'mooring screen part';
  version: number;
  /** 1-based part number, and the count of parts. */
  part: number;
  parts: number;
  /** Unordered pairs [first, end) of the universe's order held in this file. */
  first: number;
  end: number;
  totalPairs: number;
  fingerprint: string;
  names: string[];
  rows: number;
  scales: number[];
  orders: SeriesOrder[];
  settings: ScreenSettings;
  source: ScreenSource;
}

/** Unordered pairs [first, end) of part k of n (1-based): the k-th of n nearly equal runs in pair order. */
export function partRange(k: number, n: number, total: number): [number, number] {
  return [Math.floor(((k - 1) * total) / n), Math.floor((k * total) / n)];
}

/** SHA-256 of the series as screened, their orders and the settings. */
export function screenFingerprint(universe: ScreenUniverse, settings: ScreenSettings): string {
  const hash = createHash('sha256');
  hash.update(JSON.stringify({ names: universe.names, rows: universe.rows, orders: universe.orders, settings }));
  hash.update(new Uint8Array(universe.data.buffer, universe.data.byteOffset, universe.data.byteLength));
  hash.update(new Uint8Array(universe.scales.buffer, universe.scales.byteOffset, universe.scales.byteLength));
  return hash.digest('hex');
}

/** A part file being written batch by batch. */
export class PartWriter {
  private readonly fd: number;
  private written = 0;

  constructor(readonly path: string, readonly header: PartHeader) {
    if (new Uint8Array(new Float64Array([1]).buffer)[7] !== 0x3f) throw new MooringInputError('Part files are written in little-endian byte order, which this machine does not use.');
    try {
      this.fd = openSync(path, 'w');
    } catch (e) {
      throw new MooringInputError(`Cannot write '${path}': ${e instanceof Error ? e.message : String(e)}.`);
    }
    let json = JSON.stringify(header);
    json += ' '.repeat((8 - (Buffer.byteLength(json) % 8)) % 8);
    const body = Buffer.from(json, 'utf8');
    const lead = Buffer.alloc(16);
    lead.write(MAGIC, 0, 'ascii');
    lead.writeUInt32LE(VERSION, 8);
    lead.writeUInt32LE(body.length, 12);
    writeSync(this.fd, lead);
    writeSync(this.fd, body);
  }

  /** Appends the records of the next unordered pairs. */
  write(records: Float64Array): void {
    const bytes = new Uint8Array(records.buffer, records.byteOffset, records.byteLength);
    for (let at = 0; at < bytes.length;) at += writeSync(this.fd, bytes, at, bytes.length - at);
    this.written += records.length / (2 * RECORD_SIZE);
  }

  /** Closes the file; refuses if fewer pairs were written than the header promises. */
  close(): void {
    closeSync(this.fd);
    const promised = this.header.end - this.header.first;
    if (this.written !== promised) throw new RangeError(`Part file '${this.path}' holds ${this.written} of its ${promised} pairs.`);
  }
}

/** Reads and checks the header of a part file. */
export function readPartHeader(path: string): { header: PartHeader; recordsAt: number } {
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch (e) {
    const code = (e as { code?: string }).code;
    throw new MooringInputError(`Cannot read '${path}': ${code === 'ENOENT' ? 'no such file; check the name and the folder' : e instanceof Error ? e.message : String(e)}.`);
  }
  try {
    const notPart = () => new MooringInputError(`'${path}' is not a part file written by mooring screen --part k/n --out FILE.`);
    const lead = Buffer.alloc(16);
    if (readSync(fd, lead, 0, 16, 0) !== 16 || lead.toString('ascii', 0, 8) !== MAGIC) throw notPart();
    const version = lead.readUInt32LE(8);
    if (version !== VERSION) throw new MooringInputError(`'${path}' is a part file of format ${version}; this mooring reads format ${VERSION}: run every part with one version.`);
    const length = lead.readUInt32LE(12);
    const body = Buffer.alloc(length);
    if (readSync(fd, body, 0, length, 16) !== length) throw notPart();
    let header: PartHeader;
    try {
      header = JSON.parse(body.toString('utf8')) as PartHeader;
    } catch {
      throw notPart();
    }
    if (header.format !== 'mooring screen part') throw notPart();
    const recordsAt = 16 + length;
    const expected = recordsAt + (header.end - header.first) * RECORD_BYTES;
    const size = fstatSync(fd).size;
    if (size !== expected) {
      throw new MooringInputError(
        `'${path}' (part ${header.part} of ${header.parts}) holds ${Math.max(0, Math.floor((size - recordsAt) / RECORD_BYTES))} of its ${header.end - header.first} pairs: ` +
          'the run that wrote it did not finish; run that part again.',
      );
    }
    if (header.totalPairs !== unorderedPairCount(header.names.length)) throw notPart();
    return { header, recordsAt };
  } finally {
    closeSync(fd);
  }
}

/** Hands the records of a part file to `onBatch` in pair order, at most `batchPairs` pairs at a time (one buffer, reused). */
export function readPartRecords(path: string, header: PartHeader, recordsAt: number, onBatch: (first: number, records: Float64Array) => void, batchPairs = 40_000): void {
  const fd = openSync(path, 'r');
  try {
    const buffer = new Float64Array(2 * RECORD_SIZE * Math.min(batchPairs, Math.max(1, header.end - header.first)));
    const bytes = new Uint8Array(buffer.buffer);
    for (let first = header.first; first < header.end; first += batchPairs) {
      const count = Math.min(batchPairs, header.end - first);
      const length = count * RECORD_BYTES;
      const position = recordsAt + (first - header.first) * RECORD_BYTES;
      for (let at = 0; at < length;) {
        const got = readSync(fd, bytes, at, length - at, position + at);
        if (got === 0) throw new MooringInputError(`'${path}' ended early: run that part again.`);
        at += got;
      }
      onBatch(first, buffer.subarray(0, count * 2 * RECORD_SIZE));
    }
  } finally {
    closeSync(fd);
  }
}
