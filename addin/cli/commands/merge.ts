/**
 * `mooring merge`: the parts of a screen run on many machines (`mooring screen --part k/n
 * --out FILE`, one part per task of a batch job) combined into the answer one machine would
 * give: the records read in pair order into the same tally, the Benjamini-Hochberg adjustment
 * over every part's pairs at once, and the same report, JSON object or stream (--format). The
 * parts must be every part of one screen (same data, settings and part count, each once).
 */
import { MooringInputError } from '../../errors';
import { ScreenTally } from '../../screen/screen-tally';
import type { ScreenUniverse } from '../../screen/screen-universe';
import type { Command, FilesOutput } from '../command';
import { choiceValue, wholeNumberValue } from '../option-values';
import { LIST_LIMIT, STREAM_FORMATS, screenOutput, type StreamFormat } from '../screen-answer';
import { requireScreenMemory } from '../screen-memory';
import { readPartHeader, readPartRecords, type PartHeader } from '../screen-part-file';

/** Pairs listed unless --top says otherwise (as screen). */
const DEFAULT_TOP = 20;

interface Part {
  path: string;
  header: PartHeader;
  recordsAt: number;
}

/** The parts, checked to be every part of one screen once, in part order. */
function checkedParts(files: readonly string[]): Part[] {
  const parts = files.map((path) => ({ path, ...readPartHeader(path) }));
  const first = parts[0].header;
  for (const p of parts) {
    if (p.header.fingerprint !== first.fingerprint) {
      throw new MooringInputError(`'${p.path}' comes from another screen than '${parts[0].path}' (other data, series or settings): merge the parts of one screen.`);
    }
    if (p.header.parts !== first.parts) {
      throw new MooringInputError(`'${p.path}' is part ${p.header.part} of ${p.header.parts}, but '${parts[0].path}' is one of ${first.parts}: every part must come from one split.`);
    }
  }
  const byPart = new Map<number, Part>();
  for (const p of parts) {
    const twin = byPart.get(p.header.part);
    if (twin) throw new MooringInputError(`'${twin.path}' and '${p.path}' are both part ${p.header.part} of ${first.parts}: give each part once.`);
    byPart.set(p.header.part, p);
  }
  const missing = Array.from({ length: first.parts }, (_, i) => i + 1).filter((k) => !byPart.has(k));
  if (missing.length > 0) {
    const shown = missing.slice(0, 10).join(', ') + (missing.length > 10 ? `, ... (${missing.length} in all)` : '');
    throw new MooringInputError(`Part${missing.length === 1 ? '' : 's'} ${shown} of ${first.parts} ${missing.length === 1 ? 'is' : 'are'} missing: run ${missing.length === 1 ? 'it' : 'them'} and merge every part.`);
  }
  return Array.from({ length: first.parts }, (_, i) => byPart.get(i + 1) as Part);
}

/** What the tally needs of the universe, from a header (the series' numbers stay with the parts). */
function headerUniverse(h: PartHeader): ScreenUniverse {
  const N = h.names.length;
  return {
    names: h.names, rows: h.rows, data: new Float64Array(0), complete: new Uint8Array(N), means: new Float64Array(N),
    centredSquares: new Float64Array(N), scales: Float64Array.from(h.scales), orders: h.orders,
  };
}

/** The merge command. */
export const mergeCommand: Command = {
  name: 'merge',
  summary: 'the parts of a screen split across machines (screen --part k/n) combined, with the adjustment over all of them',
  description: [
    'Reads the files written by mooring screen --part k/n --out FILE, checks that they are every part of one screen (the same data, series and settings, each part once), ' +
      'and prints what mooring screen would have printed on one machine: the Benjamini-Hochberg adjustment runs here, over the pairs of every part.',
    'Takes --top, --json and --format as screen does; the CSV options do not apply (the parts carry what the output needs).',
  ],
  usage: 'mooring merge <part-1.bin> <part-2.bin> ... [--top N] [--json | --format jsonl|csv]',
  options: [
    { name: 'top', value: 'N', help: `pairs listed in the report and in --json (default ${DEFAULT_TOP})` },
    { name: 'format', value: 'jsonl|csv', help: 'write every directed pair as it goes instead of the report (as screen --format)' },
  ],
  examples: ['mooring merge part-*.bin --top 50', 'mooring merge part-*.bin --format csv > every-pair.csv'],
  run() {
    throw new MooringInputError('merge reads part files, not a price CSV.');
  },
  runOnFiles(files, args): FilesOutput {
    const top = wholeNumberValue('top', args.values.get('top'), 'pairs') ?? DEFAULT_TOP;
    const format = choiceValue('format', args.values.get('format'), STREAM_FORMATS) as StreamFormat | undefined;
    const parts = checkedParts(files);
    const h = parts[0].header;
    requireScreenMemory({ series: h.names.length, rows: h.rows, top, merge: true });
    const universe = headerUniverse(h);
    const tally = new ScreenTally(universe, h.settings, top, LIST_LIMIT);
    const records = (onBatch: (first: number, records: Float64Array) => void) => {
      for (const p of parts) readPartRecords(p.path, p.header, p.recordsAt, onBatch);
    };
    records((first, batch) => tally.add(first, batch));
    const { summary, adjustment } = tally.finish();
    const output = screenOutput({ summary, adjustment, scales: universe.scales, source: h.source, top, threads: { parts: h.parts }, records }, format);
    return { output, file: h.source.file, notices: h.source.notices, halfLifeUnit: h.source.halfLifeUnit, spacing: h.source.spacing };
  },
};
