/**
 * Which pair the pair stages show. With two series there is one pair; with more, the user
 * picks one, and the list orders the pairs by their reading (tied first, then tied one way,
 * mixed evidence, no tie, and pairs that are not two wandering prices; report order within
 * each), each labelled with the words of its mark, so the strongest evidence is one step away.
 */
import type { DiagnosticReport } from '../../../addin/report/report-types';
import type { PairReport } from '../../../addin/report/pair-types';
import { TIE_ORDER, tieReading } from './tied-view';

/** A pair in the picker. */
export interface PairOption {
  /** Index into report.pairs. */
  index: number;
  label: string;
  tied: boolean;
}


/** The pairs of a report for the picker, strongest reading first, each in report order. */
export function pairOptions(report: DiagnosticReport): PairOption[] {
  const options = report.pairs.map((p, index) => {
    const reading = tieReading(p);
    return { index, label: `${p.a} and ${p.b} (${reading.mark.word.toLowerCase()})`, tied: reading.kind === 'tied', order: TIE_ORDER[reading.kind] };
  });
  return options.sort((x, y) => x.order - y.order || x.index - y.index).map(({ index, label, tied }) => ({ index, label, tied }));
}

/** The pair to show: the one asked for when it exists, else the first in the picker. */
export function chosenPair(report: DiagnosticReport, asked: number | null): { index: number; pair: PairReport } | null {
  if (report.pairs.length === 0) return null;
  const index = asked !== null && asked >= 0 && asked < report.pairs.length ? asked : pairOptions(report)[0].index;
  return { index, pair: report.pairs[index] };
}
