/**
 * The overview of every pair of a report, for "Tied together?" with more than two series:
 * one row per pair with its reading (the same decision as the pair's mark), both Engle-Granger
 * p-values and the half-life of its spread, sortable by any column. Every number is the
 * report's; the sort only orders rows.
 */
import type { DiagnosticReport } from '../../../addin/report/report-types';
import { showNumber, showPValue } from './numbers';
import { TIE_ORDER, tieReading, type TieKind } from './tied-view';
import type { VerdictMark } from './verdict-mark';

/** A column the overview sorts by. */
export type OverviewKey = 'pair' | 'reading' | 'p' | 'halfLife';

/** How the overview is sorted. */
export interface OverviewSort {
  key: OverviewKey;
  descending: boolean;
}

/** The first sort: strongest reading first. */
export const DEFAULT_OVERVIEW_SORT: OverviewSort = { key: 'reading', descending: false };

/** One pair's row. */
export interface OverviewRow {
  /** Index into report.pairs. */
  index: number;
  label: string;
  mark: VerdictMark;
  kind: TieKind;
  /** Both Engle-Granger p-values, the first series on the second then the other way. */
  pValues: [string, string];
  /** The larger of the two p-values (the cautious one), for sorting. */
  worstP: number | null;
  halfLife: string;
  halfLifeValue: number | null;
}

/** The overview's view. */
export interface PairOverview {
  caption: string;
  columns: { key: OverviewKey; label: string; sort: 'ascending' | 'descending' | 'none' }[];
  rows: OverviewRow[];
}

function compareNullable(a: number | null, b: number | null): number {
  if (a === null && b === null) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  return a - b;
}

/** The rows of a report's pairs, sorted. Missing numbers sort last either way. */
export function pairOverview(report: DiagnosticReport, sort: OverviewSort = DEFAULT_OVERVIEW_SORT): PairOverview {
  const period = report.data.period;
  const rows: OverviewRow[] = report.pairs.map((p, index) => {
    const reading = tieReading(p);
    const { aOnB, bOnA } = p.cointegration.engleGranger;
    const ps = [aOnB.pValue, bOnA.pValue].filter((v): v is number => typeof v === 'number' && Number.isFinite(v));
    const h = p.adjustment?.spreadAr1.halfLife ?? null;
    return {
      index,
      label: `${p.a} and ${p.b}`,
      mark: reading.mark,
      kind: reading.kind,
      pValues: [showPValue(aOnB.pValue, aOnB.pValueBound), showPValue(bOnA.pValue, bOnA.pValueBound)],
      worstP: ps.length === 2 ? Math.max(ps[0], ps[1]) : null,
      halfLife: h === null ? 'none' : `${showNumber(h, 1)}`,
      halfLifeValue: h,
    };
  });
  const byKey: Record<OverviewKey, (a: OverviewRow, b: OverviewRow) => number> = {
    pair: (a, b) => a.label.localeCompare(b.label),
    reading: (a, b) => TIE_ORDER[a.kind] - TIE_ORDER[b.kind] || compareNullable(a.worstP, b.worstP),
    p: (a, b) => compareNullable(a.worstP, b.worstP),
    halfLife: (a, b) => compareNullable(a.halfLifeValue, b.halfLifeValue),
  };
  const missing = (r: OverviewRow): boolean => (sort.key === 'p' && r.worstP === null) || (sort.key === 'halfLife' && r.halfLifeValue === null);
  const present = rows.filter((r) => !missing(r)).sort((a, b) => (sort.descending ? -1 : 1) * byKey[sort.key](a, b) || a.index - b.index);
  const sorted = [...present, ...rows.filter(missing)];
  const label: Record<OverviewKey, string> = { pair: 'Pair', reading: 'Reading', p: 'Engle-Granger p, each way', halfLife: `Half-life (${period}s)` };
  return {
    caption: `All ${report.pairs.length} pairs: press a pair to open it, a column head to sort.`,
    columns: (['pair', 'reading', 'p', 'halfLife'] as const).map((key) => ({ key, label: label[key], sort: key === sort.key ? (sort.descending ? 'descending' : 'ascending') : 'none' })),
    rows: sorted,
  };
}
