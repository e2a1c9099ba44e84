/**
 * How the results block looks: number formats for each kind of number, the heading and note
 * styles, and the soft fills a verdict takes from its own words. Colour never carries meaning
 * alone: every coloured cell holds the verdict as text, and the fill follows that text
 * (conditional on how it begins), so when new rows change a verdict its colour changes too.
 */
import type { CellFormat } from '../workbook/port';

/** Number formats by kind of number. */
export const NUMBER_FORMAT = {
  pValue: '0.0000',
  ratio: '0.000',
  statistic: '0.00',
  count: '0',
  level: '0%',
  date: 'yyyy-mm-dd',
  spread: '0.0000',
} as const;

/** The half-life format: one decimal and the period word ("0.0 \"days\""). */
export function periodsFormat(period: string): string {
  const plural = period.endsWith('s') ? period : `${period}s`;
  return `0.0 "${plural.replace(/"/g, '')}"`;
}

/** Fills, as #rrggbb. */
export const FILL = {
  supported: '#d9eedf',
  notSupported: '#f7e6cc',
  missing: '#e7e7e7',
  title: '#dde6f0',
  fixed: '#fff7d6',
} as const;

/** Words that begin each kind of reading; the fills key on them (none begins another). */
export const VERDICT_START = {
  supported: 'yes',
  notSupported: 'no',
  missing: 'n/a',
} as const;

/** The conditional fills every verdict cell carries. */
export const VERDICT_FILLS: NonNullable<CellFormat['textFills']> = [
  { startsWith: VERDICT_START.supported, fill: FILL.supported },
  { startsWith: VERDICT_START.notSupported, fill: FILL.notSupported },
  { startsWith: VERDICT_START.missing, fill: FILL.missing },
];

/** Styles of the block's kinds of cell. */
export const STYLE = {
  title: { heading: 1, bold: true, fill: FILL.title } as CellFormat,
  section: { heading: 2, bold: true } as CellFormat,
  label: {} as CellFormat,
  note: { italic: true, fontColor: '#555555', wrap: false } as CellFormat,
  verdict: { textFills: VERDICT_FILLS } as CellFormat,
  caution: { italic: true } as CellFormat,
  columnHead: { bold: true } as CellFormat,
};

/** Column widths in points: label, number, reading, how it was made, gap, then the chart data. */
export const COLUMN_WIDTHS = [300, 80, 260, 360, 16, 80, 80, 90, 90, 70];
