/**
 * What `mooring screen` and `mooring merge` print, from one screen's tally: the terminal
 * report, the one JSON object (--json), and the stream of every directed pair (--format jsonl
 * or csv). Both commands call these functions with the same tally and the same records, so a
 * merge of parts prints what one machine prints. Memory: the report and the JSON object hold
 * the pairs asked for (--top) and at most LIST_LIMIT set-aside and untested pairs; the stream
 * reads the records back a batch at a time and writes as it goes.
 */
import type { FalseDiscoveryAdjustment } from '../screen/benjamini-hochberg';
import { FIELD, PAIR_STATUS, RECORD_SIZE, isTested, untestedReason } from '../screen/pair-record';
import { decodePair, type ScreenPair } from '../screen/screen-ranking';
import type { ScreenSettings } from '../screen/screen-options';
import { halfLifeInRange, type ScreenSummary } from '../screen/screen-tally';
import { unorderedPairAt } from '../screen/screen-universe';
import { setAsidePairs, setAsideReason, type SeriesOrder } from '../screen/series-orders';
import type { ThreadReport } from '../screen/parallel-node';
import type { CommandOutput } from './command';
import { bullet, formatPValue, formatStatistic, heading, labelled } from './render/format';
import { shownName, shownNames, withShownNames } from './render/shown-name';
import { jsonText, terminalText } from './render/terminal-text';
import { textTable } from './render/text-table';
import type { ScreenSource } from './screen-part-file';

/** Set-aside and untested pairs listed in the JSON object at most (all are counted; the stream lists every one). */
export const LIST_LIMIT = 1000;

/** The output formats that stream every directed pair. */
export const STREAM_FORMATS = ['jsonl', 'csv'] as const;
export type StreamFormat = (typeof STREAM_FORMATS)[number];

/** Everything the output is made from. */
export interface ScreenAnswer {
  summary: ScreenSummary;
  adjustment: FalseDiscoveryAdjustment;
  /** Each series' power-of-two factor (the records are in those units). */
  scales: ArrayLike<number>;
  source: ScreenSource;
  /** Pairs listed in the report and the JSON object. */
  top: number;
  /** How the work was spread, for the report and --json (absent for a merge's own run). */
  threads: ThreadReport | { parts: number };
  /** Reads every record again, in pair order, for the stream. */
  records: (onBatch: (first: number, records: Float64Array) => void) => void;
}

/** The ranked pairs as a table: each column as wide as its widest cell, two spaces between. */
function pairTable(shown: readonly ScreenPair[], halfLifeUnit: string): string[] {
  return textTable(
    ['rank', 'pair (y on x)', 'tau', 'p-value', 'adjusted', 'beta', `half-life (${halfLifeUnit})`, 'z-score'],
    shown.map((p, i) => [
      String(i + 1), `${shownName(p.y)} on ${shownName(p.x)}`, formatStatistic(p.statistic), formatPValue(p.pValue), formatPValue(p.adjustedPValue),
      formatStatistic(p.beta), p.halfLife === null ? 'none' : formatStatistic(p.halfLife), formatStatistic(p.zscore),
    ]),
    [1],
  );
}

function threadText(threads: ScreenAnswer['threads']): string {
  if ('parts' in threads) return `${threads.parts} part${threads.parts === 1 ? '' : 's'} merged`;
  return `${threads.threads}${threads.note ? ` (${threads.note})` : ''}`;
}

/** Series named one by one in the report up to this many; past it, the first few and the count. */
const NAMED_IN_FULL = 40;

/** "I(1) 1,850 series, I(0) 120, undecided 3": the orders of a large universe counted. */
function orderCounts(orders: readonly SeriesOrder[]): string {
  const counts = new Map<string, number>();
  for (const o of orders) counts.set(o.orderText ?? 'undecided', (counts.get(o.orderText ?? 'undecided') ?? 0) + 1);
  return `${[...counts].map(([text, n]) => `${text} ${n}`).join(', ')} series (--json lists each)`;
}

function terminalReport(a: ScreenAnswer): string {
  const s = a.summary;
  const shown = s.pairs.slice(0, a.top);
  // Long names shortened here too: a merge reads its names from the part files, not from a table.
  const long = shownNames([...s.names, ...a.source.leftOut]);
  const show = (text: string) => withShownNames(text, long);
  const names = s.names.map(shownName);
  const out = [
    heading(`Pair screen of ${s.names.length} series`),
    '',
    labelled('Series', names.length <= NAMED_IN_FULL ? names.join(', ') : `${names.slice(0, 8).join(', ')}, ... (${names.length} in all; --json lists them)`),
    ...(a.source.leftOut.length ? [labelled('Left out', `${a.source.leftOut.map(shownName).join(', ')} (not numeric)`)] : []),
    labelled('Orders', s.orders.length <= NAMED_IN_FULL ? s.orders.map((o) => `${shownName(o.name)} ${o.orderText ?? 'undecided'}`).join(', ') : orderCounts(s.orders)),
    labelled('Tested', `${s.family.size} directed pairs (Engle-Granger, constant, lags by the rule)`),
    labelled('Adjustment', `Benjamini-Hochberg over ${s.family.description}`),
    labelled('parts' in a.threads ? 'Parts' : 'Threads', threadText(a.threads)),
    '',
    bullet(s.chanceSentence, 0, '*'),
    '',
    ...(s.ranked === 0 ? [s.family.size === 0 ? '  No pair was tested.' : '  No pair meets the half-life range.'] : shown.length === 0 ? [] : pairTable(shown, a.source.halfLifeUnit)),
  ];
  if (s.ranked > shown.length) out.push(`  ... ${s.ranked - shown.length} more pairs (--top N shows more; --format jsonl or csv lists every pair)`);
  if (s.setAsideCount > 0) {
    out.push(
      '',
      labelled('Set aside', `${s.setAsideCount} directed pairs, not ranked: a pair needs two wandering series of the same order (--json lists them under setAside)`),
      ...s.setAsideSummary.map((line) => bullet(show(line))),
    );
  }
  if (s.untestedCount > 0) out.push('', labelled('Not tested', `${s.untestedCount} directed pairs; --json lists them with the reason`));
  out.push('', ...s.cautions.map((c) => bullet(show(c))));
  return out.join('\n');
}

/** The pair with the unit of its half-life and the line and date of its last shared row. */
function withRow(p: ScreenPair, source: ScreenSource): ScreenPair & { halfLifeUnit: string; lastLine: number; lastDate: string | null } {
  return { ...p, halfLifeUnit: source.halfLifeUnit, lastLine: source.lines[p.lastRow], lastDate: source.dates?.[p.lastRow]?.trim() || null };
}

/** The fields every output shares about the screen as a whole. */
function screenFields(a: ScreenAnswer): Record<string, unknown> {
  const s = a.summary;
  return {
    series: s.names,
    leftOut: a.source.leftOut,
    alpha: s.alpha,
    halfLifeUnit: a.source.halfLifeUnit,
    orders: s.orders,
    orderTests: s.orderTests,
    family: s.family,
    rawPasses: s.rawPasses,
    expectedByChance: s.expectedByChance,
    discoveries: s.discoveries,
    chanceSentence: s.chanceSentence,
    rankedCount: s.ranked,
    setAsideCount: s.setAsideCount,
    setAsideSummary: s.setAsideSummary,
    untestedCount: s.untestedCount,
    screenCautions: s.cautions,
  };
}

/** The JSON object of --json: the screen, its best pairs (--top) and the first LIST_LIMIT set-aside and untested pairs. */
function jsonObject(a: ScreenAnswer): Record<string, unknown> {
  return {
    ...screenFields(a),
    pairs: a.summary.pairs.slice(0, a.top).map((p) => withRow(p, a.source)),
    setAside: setAsidePairs(a.summary.orders, LIST_LIMIT),
    untested: a.summary.untested.slice(0, LIST_LIMIT),
    threads: a.threads,
  };
}

/** Columns of the CSV stream. */
const CSV_COLUMNS = [
  'y', 'x', 'status', 'orderY', 'orderX', 'statistic', 'pValue', 'adjustedPValue', 'discovery', 'inHalfLifeRange',
  'beta', 'intercept', 'halfLife', 'halfLifeUnit', 'zscore', 'lags', 'nobs', 'lastLine', 'lastDate', 'rSquared', 'johansenRank', 'reason',
] as const;

/** A CSV field: text made safe for a terminal, quoted when it holds a comma or a quote; numbers in full; none as empty. */
function csvField(v: unknown): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number') return Number.isFinite(v) ? String(v) : '';
  if (typeof v !== 'string') return String(v);
  const t = terminalText(v, true);
  return t.includes(',') || t.includes('"') ? `"${t.replace(/"/g, '""')}"` : t;
}

/** One directed pair as a row of the stream: every pair, tested or not (one object, its fields in the order of CSV_COLUMNS). */
function pairRow(
  a: ScreenAnswer, records: Float64Array, r: number, yi: number, xi: number, orders: readonly SeriesOrder[], settings: ScreenSettings,
): Record<string, unknown> {
  const base = r * RECORD_SIZE;
  const status = records[base + FIELD.status];
  const { names } = a.summary;
  if (isTested(status)) {
    const p = decodePair(names, records, r, yi, xi, a.adjustment.adjusted(records[base + FIELD.pValue]), settings, orders, a.scales);
    const row: Record<string, unknown> = {
      y: p.y, x: p.x, status: 'tested', orderY: p.orderY, orderX: p.orderX, statistic: p.statistic, pValue: p.pValue,
      adjustedPValue: p.adjustedPValue, discovery: p.discovery, inHalfLifeRange: halfLifeInRange(records[base + FIELD.halfLife], settings),
      beta: p.beta, intercept: p.intercept, halfLife: p.halfLife, halfLifeUnit: a.source.halfLifeUnit, zscore: p.zscore, lags: p.lags, nobs: p.nobs, lastRow: p.lastRow,
      lastLine: a.source.lines[p.lastRow], lastDate: a.source.dates?.[p.lastRow]?.trim() || null, rSquared: p.rSquared,
    };
    if (settings.johansen) row.johansenRank = p.johansenRank;
    row.reason = p.note ?? null;
    return row;
  }
  const reason = status === PAIR_STATUS.setAside
    ? setAsideReason(orders[yi], orders[xi])
    : untestedReason(status, records[base + FIELD.nobs], settings.minObservations);
  return {
    y: names[yi], x: names[xi], status: status === PAIR_STATUS.setAside ? 'set aside' : 'not tested',
    orderY: orders[yi].order, orderX: orders[xi].order, reason,
  };
}

/** JSON replacer: non-finite numbers as null. */
function finite(_key: string, value: unknown): unknown {
  return typeof value === 'number' && !Number.isFinite(value) ? null : value;
}

/** Writes every directed pair in pair order ((i, j) then (j, i) for i < j), as JSON lines after one line on the screen, or as CSV. */
function streamPairs(a: ScreenAnswer, format: StreamFormat, write: (s: string) => void): void {
  const { names, orders, settings } = a.summary;
  const N = names.length;
  let text = format === 'jsonl'
    ? `${jsonText(JSON.stringify({ kind: 'screen', ...screenFields(a) }, finite))}\n`
    : `${CSV_COLUMNS.join(',')}\n`;
  const line = (row: Record<string, unknown>) =>
    format === 'jsonl'
      ? `${jsonText(JSON.stringify({ kind: 'pair', ...row }, finite))}\n`
      : `${CSV_COLUMNS.map((c) => csvField(row[c])).join(',')}\n`;
  a.records((first, records) => {
    const count = records.length / (2 * RECORD_SIZE);
    let [i, j] = unorderedPairAt(first, N);
    for (let k = 0; k < count; k++) {
      text += line(pairRow(a, records, 2 * k, i, j, orders, settings));
      text += line(pairRow(a, records, 2 * k + 1, j, i, orders, settings));
      if (text.length > 1 << 20) {
        write(text);
        text = '';
      }
      j++;
      if (j === N) {
        i++;
        j = i + 1;
      }
    }
  });
  write(text);
}

/** The command's output: the report, the JSON object, and with a stream format the stream instead. */
export function screenOutput(a: ScreenAnswer, format: StreamFormat | undefined): CommandOutput {
  const output: CommandOutput = { terminal: terminalReport(a), json: jsonObject(a) };
  if (format) output.stream = (write) => streamPairs(a, format, write);
  return output;
}
