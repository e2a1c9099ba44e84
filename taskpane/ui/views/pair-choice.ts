/**
 * Which pair the pair stages show. With two series there is one pair; with more, the user
 * picks one, and the list puts the pairs the engine found tied first (in the engine's order
 * of findings), so the strongest evidence is one step away.
 */
import type { DiagnosticReport } from '../../../addin/report/report-types';
import type { PairReport } from '../../../addin/report/pair-types';

/** A pair in the picker. */
export interface PairOption {
  /** Index into report.pairs. */
  index: number;
  label: string;
  tied: boolean;
}

/** The pairs of a report for the picker: tied pairs first, then the rest, each in report order. */
export function pairOptions(report: DiagnosticReport): PairOption[] {
  const options = report.pairs.map((p, index) => ({
    index,
    label: `${p.a} and ${p.b}${p.cointegration.cointegrated ? ' (tied)' : ''}`,
    tied: p.cointegration.cointegrated,
  }));
  return [...options.filter((o) => o.tied), ...options.filter((o) => !o.tied)];
}

/** The pair to show: the one asked for when it exists, else the first in the picker. */
export function chosenPair(report: DiagnosticReport, asked: number | null): { index: number; pair: PairReport } | null {
  if (report.pairs.length === 0) return null;
  const index = asked !== null && asked >= 0 && asked < report.pairs.length ? asked : pairOptions(report)[0].index;
  return { index, pair: report.pairs[index] };
}
