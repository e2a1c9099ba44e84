/**
 * Number and text formatting for the terminal: fixed decimals for statistics, bounded
 * p-values, word wrapping, and label-value lines of a report.
 */

import { formatBoundedPValue, type PValueBound } from '../../p-value-bound';

/** Width of a terminal report line. */
export const REPORT_WIDTH = 78;

/** Width of the label column in label-value lines. */
export const LABEL_WIDTH = 22;

/** A statistic to four decimals; very large or very small magnitudes in exponent form. */
export function formatStatistic(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return 'not available';
  const a = Math.abs(x);
  if (a !== 0 && (a >= 1e6 || a < 1e-3)) return x.toExponential(3);
  return x.toFixed(4);
}

/**
 * A p-value to four decimals, "< 0.0001" below that, "not available" when missing; a bounded
 * p-value (a table's end) as its bound, "< 0.01" or "> 0.10".
 */
export function formatPValue(p: number | null | undefined, bound?: PValueBound): string {
  return formatBoundedPValue(p, bound, (x) => {
    if (x === null || x === undefined || !Number.isFinite(x)) return 'not available';
    if (x < 0.0001) return '< 0.0001';
    return x.toFixed(4);
  });
}

/**
 * Any value of a detail: whole numbers as they are, other numbers as statistics (as p-values
 * when the key says so), yes/no for booleans.
 */
export function formatDetail(v: number | string | boolean | null, key = ''): string {
  if (v === null) return 'not available';
  if (typeof v === 'number' && /pvalue$/i.test(key)) return formatPValue(v);
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (typeof v === 'string') return v;
  if (Number.isInteger(v) && Math.abs(v) < 1e9) return String(v);
  return formatStatistic(v);
}

/** Splits text into lines of at most `width` characters at spaces (a longer word stands alone). */
export function wrapWords(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter((w) => w.length > 0)) {
    if (line === '') line = word;
    else if (line.length + 1 + word.length <= width) line += ` ${word}`;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line !== '' || lines.length === 0) lines.push(line);
  return lines;
}

/**
 * "  label      value": the value starts in the value column and wraps under itself; a value
 * that fits keeps its own spacing. A label too long for its column (less a two-space gap) stands
 * on a line of its own.
 */
export function labelled(label: string, value: string, indent = 2): string {
  const pad = ' '.repeat(indent);
  const column = ' '.repeat(indent + LABEL_WIDTH);
  const room = REPORT_WIDTH - column.length;
  const valueLines = value.length <= room ? [value] : wrapWords(value, room);
  const body = valueLines.map((l, i) => (i === 0 ? l : column + l));
  // at least two spaces between a label and its value, so the two never read as one phrase
  if (label.length > LABEL_WIDTH - 2) return `${pad}${label}
${column}${body.join('\n')}`;
  return `${pad}${label}`.padEnd(column.length) + body.join('\n');
}

/** A bulleted item, wrapped with a hanging indent. */
export function bullet(text: string, indent = 2, mark = '-'): string {
  const pad = ' '.repeat(indent);
  const [first, ...rest] = wrapWords(text, REPORT_WIDTH - indent - 2);
  return [`${pad}${mark} ${first}`, ...rest.map((l) => `${pad}  ${l}`)].join('\n');
}

/** A heading underlined to its length. */
export function heading(text: string): string {
  return `${text}\n${'='.repeat(Math.min(text.length, REPORT_WIDTH))}`;
}
