/**
 * The pairs in the terminal diagnostic. A pair with a long-run relation gets a block: its
 * tests in a small table, the relation, the halves, the half-lives, who adjusts, where the
 * spread stands, the lead-lag tests with the reason for their choice, its verdicts and its
 * warnings. The other pairs share one compact table (the JSON and HTML keep all their
 * detail). Layout only.
 */
import type { PairReport } from '../../report/pair-types';
import type { DiagnosticReport } from '../../report/report-types';
import { bullet, formatPValue, formatStatistic, labelled } from './format';
import { leadLagLags, leadLagRows, testCells } from './lead-lag-rows';
import { fixed1, fixed4 } from './number-text';
import { textTable } from './text-table';

/** A table row for one test: what, which way, statistic, p-value, decision. */
export const testRow = testCells;

/** "11.9 days", or the note when there is no half-life. */
export function periodsText(x: number | null, note: string | null, period: string): string {
  return x === null ? (note ?? 'none') : `${x.toFixed(1)} ${period}s`;
}

function levelWords(report: DiagnosticReport): string {
  return `at ${Number((report.settings.alpha * 100).toPrecision(6))}%`;
}

/** The block of a pair with a long-run relation. */
export function renderPairTerminal(pair: PairReport, report: DiagnosticReport): string {
  const period = report.data.period;
  const title = `${pair.a} and ${pair.b}`;
  const out: string[] = [title, '-'.repeat(title.length)];
  const c = pair.cointegration;
  const rows = [
    testRow('Engle-Granger tau', `${c.engleGranger.aOnB.dependent} on ${c.engleGranger.aOnB.regressor}`, c.engleGranger.aOnB),
    testRow('Engle-Granger tau', `${c.engleGranger.bOnA.dependent} on ${c.engleGranger.bOnA.regressor}`, c.engleGranger.bOnA),
  ];
  if (c.phillipsOuliaris) rows.push(testRow('Phillips-Ouliaris Z-t', pair.relation ? `${pair.relation.dependent} on ${pair.relation.regressor}` : `${pair.a} on ${pair.b}`, c.phillipsOuliaris));
  if (c.johansen) c.johansen.trace.forEach((t, r) => rows.push(testRow(`Johansen trace, r = ${r}`, `${c.johansen?.case}, K = ${c.johansen?.lags}`, t)));
  out.push('', ...textTable(['test', 'which way / case', 'statistic', 'p-value', levelWords(report)], rows, [0, 1, 4]), '');
  if (c.johansen) out.push(labelled('Johansen choices', `${c.johansen.caseReason} ${c.johansen.lagsReason}`));

  const r = pair.relation;
  if (r) {
    out.push(labelled('Long-run relation', `${r.text} (dynamic OLS with ${r.dynamicOls.leadsLags} leads and lags; standard error ${formatStatistic(r.dynamicOls.standardError)} ${r.dynamicOls.standardErrorMethod})`));
    out.push(labelled('Hedge', r.hedgeText));
    out.push(labelled('Least-squares line', `beta ${formatStatistic(r.ols.beta)}, intercept ${formatStatistic(r.ols.intercept)} (the spread is built on this line)`));
    out.push(labelled('Written as', r.normalisationReason));
    if (r.halves) {
      const h = r.halves;
      out.push(labelled('Halves of the sample', `beta ${formatStatistic(h.first.beta)} (s.e. ${formatStatistic(h.first.standardError)}), then ${formatStatistic(h.second.beta)} ` +
        `(s.e. ${formatStatistic(h.second.standardError)}): ${h.differenceInStandardErrors.toFixed(1)} standard errors apart, ${h.stable ? 'steady' : 'moved'}`));
    } else if (r.halvesNote) {
      out.push(labelled('Halves of the sample', r.halvesNote));
    }
  }
  const adj = pair.adjustment;
  if (adj) {
    out.push(labelled('Half-life', `${periodsText(adj.spreadAr1.halfLife, adj.spreadAr1.halfLifeNote, period)}: ${adj.spreadAr1.definition} (AR(1) coefficient ${formatStatistic(adj.spreadAr1.phi)})`));
    out.push(labelled('Half-life interval', `${adj.spreadAr1.halfLifeInterval.text} (${adj.spreadAr1.halfLifeInterval.method})`));
    out.push(labelled('ECM half-life', `${periodsText(adj.ecm.ecmHalfLife, adj.ecm.ecmHalfLifeNote, period)}: implied by the error-correction model, both prices adjusting`));
    const side = (s: typeof adj.ecm.dependent): string => `${s.series} ${fixed4(s.speed)} (p ${formatPValue(s.pValue)}${s.corrects ? ', closes the gap' : ''})`;
    out.push(labelled('Speed of adjustment', `${side(adj.ecm.dependent)}; ${side(adj.ecm.regressor)}`));
  }
  const moving = pair.movingHedge;
  if (moving) {
    out.push(labelled('Ratio through time', `${moving.latest.text} (Kalman filter). ${moving.driftText} ${moving.driftMeaning}`));
  }
  const f = pair.forecast;
  if (f) {
    const last = f.horizon - 1;
    const when = f.dates ? f.dates[last] : `${f.horizon} rows ahead`;
    out.push(labelled('Heading', `${f.series.map((name, i) => `${name} ${formatStatistic(f.forecast[last][i])} (${formatStatistic(f.lower[last][i])} to ${formatStatistic(f.upper[last][i])})`).join(', ')} by ${when}; ` +
      `the spread ${f.spread.text} from ${formatStatistic(f.spread.recent[f.spread.recent.length - 1])} to ${formatStatistic(f.spread.path[last])} (equilibrium ${formatStatistic(f.spread.mean)}). ${f.bandNote}`));
  }
  const sp = pair.spread;
  if (sp) {
    const rolling = sp.latestRollingZ === null ? '' : `, ${formatStatistic(sp.latestRollingZ)} over the last ${sp.rollingWindow} ${period}s`;
    out.push(labelled('Spread', sp.definition));
    out.push(labelled('Spread now', `z-score ${formatStatistic(sp.latestZ)} over the whole sample${rolling} (${sp.latestDate ?? sp.latestRow})`));
  }
  const ll = pair.leadLag;
  if (ll) {
    out.push('', ...textTable(['lead-lag test', 'question', 'statistic', 'p-value', levelWords(report)], leadLagRows(pair), [0, 1, 4]), '');
    out.push(labelled('Why this test', `${ll.why} Lags: ${leadLagLags(pair)}.`));
  }
  out.push('', '  In plain words');
  for (const v of pair.verdicts) out.push(bullet(v, 4, '*'));
  if (pair.warnings.length > 0) {
    out.push('', '  Warnings');
    for (const w of pair.warnings) out.push(bullet(w.text, 4, '!'));
  }
  return out.join('\n');
}

function leadLagCell(pair: PairReport): string {
  const ll = pair.leadLag;
  if (!ll) return 'not available';
  if (ll.pattern === 'one-way') return `${ll.leader} leads`;
  return ll.pattern === 'both-ways' ? 'both ways' : 'neither';
}

/** One table for the pairs without a long-run relation, and their warnings. */
export function renderOtherPairsTerminal(pairs: readonly PairReport[], report: DiagnosticReport): string {
  const rows = pairs.map((p) => {
    const c = p.cointegration;
    const notI1 = report.series.filter((s) => (s.name === p.a || s.name === p.b) && s.order !== 1).map((s) => `${s.name} ${s.orderText}`);
    return [
      `${p.a} / ${p.b}`,
      formatPValue(c.engleGranger.aOnB.pValue),
      formatPValue(c.engleGranger.bOnA.pValue),
      c.johansen ? String(c.johansen.rank.trace) : '-',
      leadLagCell(p),
      notI1.length > 0 ? `not both I(1): ${notI1.join(', ')}` : 'no long-run relation',
    ];
  });
  const out = [
    'Pairs without a long-run relation',
    '---------------------------------',
    '',
    ...textTable(['pair (a / b)', 'EG p, a on b', 'EG p, b on a', 'Johansen rank', `lead-lag ${levelWords(report)}`, 'reading'], rows, [0, 4, 5]),
  ];
  // The reading column already says when the inputs are not both I(1).
  const warnings = pairs.flatMap((p) => p.warnings.filter((w) => w.kind !== 'inputs-not-integrated').map((w) => `${p.a} and ${p.b}: ${w.text}`));
  if (warnings.length > 0) {
    out.push('', '  Warnings');
    for (const w of warnings) out.push(bullet(w, 4, '!'));
  }
  return out.join('\n');
}
