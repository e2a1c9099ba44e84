/** The rows of the lead-lag table, shared by the terminal and HTML renderings of a pair. */
import type { LeadLagDirectionSummary, PairReport } from '../../report/pair-types';
import type { TestSummary } from '../../report/test-summary';
import { formatPValue, formatStatistic } from './format';

/** Test, question, statistic, p-value, decision for one test. */
export function testCells(test: string, which: string, t: TestSummary): string[] {
  const statistic = t.statistic === null ? (t.statisticNote ?? 'not available') : formatStatistic(t.statistic);
  const decision = t.rejects === null ? 'no decision' : t.rejects ? 'rejects' : 'does not reject';
  return [test, which, statistic, formatPValue(t.pValue, t.pValueBound), decision];
}

function directionRows(d: LeadLagDirectionSummary): string[][] {
  const question = `does ${d.cause} lead ${d.effect}?`;
  if (d.longRun === null) return [testCells(d.test.test, question, d.test)];
  // The error-correction form judges each of its two tests at half the level.
  const at = `at ${Number((d.level * 100).toPrecision(6))}%`;
  return [testCells(d.test.test, `${question} (short run, ${at})`, d.test), testCells(d.longRun.test, `${question} (long run, ${at})`, d.longRun)];
}

/** Every lead-lag test of the pair, both directions. */
export function leadLagRows(pair: PairReport): string[][] {
  return pair.leadLag ? [...directionRows(pair.leadLag.aLeadsB), ...directionRows(pair.leadLag.bLeadsA)] : [];
}

/** "2, aic (VAR order of the pair, up to 20; at least 1)". */
export function leadLagLags(pair: PairReport): string {
  const t = pair.leadLag?.aLeadsB.test;
  return t ? `${t.lags ?? '-'}, ${t.lagRule ?? ''}` : '-';
}
