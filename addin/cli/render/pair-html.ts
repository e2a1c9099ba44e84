/**
 * One pair's article in the HTML report: a status tag, the verdicts in plain words, the key
 * figures, the charts of the spread (with its mean and bands at two standard deviations) and
 * of its rolling z-score, and the tables of tests behind them. Layout only: every number is
 * the report's.
 */
import type { PairReport } from '../../report/pair-types';
import type { DiagnosticReport } from '../../report/report-types';
import { formatPValue, formatStatistic } from './format';
import { el, escapeHtml, htmlTable } from './html-text';
import { leadLagLags, leadLagRows, testCells } from './lead-lag-rows';
import { fixed1, fixed4 } from './number-text';
import { lineChart } from './svg-chart';

/** Colours of the pair charts. */
export const PAIR_COLOURS = { spread: '#1f5f66', mean: '#6d6a60', band: '#b4552f', zscore: '#5a4a86', zero: '#6d6a60', filtered: '#8a6d1f', smoothedBand: '#9fb7b9' };

function statusOf(pair: PairReport): { text: string; className: string } {
  const c = pair.cointegration;
  if (!c.bothIntegrated) return { text: 'inputs not both I(1)', className: 'tag tag-off' };
  if (c.evidence === 'both-directions') return { text: 'long-run relation', className: 'tag tag-yes' };
  if (c.evidence === 'one-direction') return { text: 'borderline', className: 'tag tag-maybe' };
  return { text: 'no long-run relation', className: 'tag tag-no' };
}


function figure(label: string, value: string): string {
  return `<div class="figure">${el('dt', label)}${el('dd', value)}</div>`;
}

function keyFigures(pair: PairReport, period: string): string {
  const items: string[] = [];
  if (pair.relation) {
    items.push(figure('Long-run relation', `${pair.relation.text} (dynamic OLS; s.e. ${formatStatistic(pair.relation.dynamicOls.standardError)}, from the long-run variance)`));
    items.push(figure(pair.relation.slopeMeaning === 'elasticity' ? 'Units to hold at the latest prices' : 'Units to hold', formatStatistic(pair.relation.dynamicOls.hedgeUnits)));
  }
  const ar1 = pair.adjustment?.spreadAr1;
  if (ar1) items.push(figure('Half-life of the spread', ar1.halfLife === null ? (ar1.halfLifeNote ?? 'none') : `${fixed1(ar1.halfLife)} ${period}s (AR(1) of the spread on the least-squares line), ${ar1.halfLifeInterval.text}`));
  if (pair.spread) items.push(figure(`Spread now (${pair.spread.latestDate ?? pair.spread.latestRow})`, `z = ${formatStatistic(pair.spread.latestZ)}`));
  if (pair.leadLag) items.push(figure('Leader', pair.leadLag.leader ?? (pair.leadLag.pattern === 'both-ways' ? 'feedback both ways' : 'none found')));
  return items.length === 0 ? '' : `<dl class="figures">${items.join('')}</dl>`;
}

function charts(pair: PairReport, report: DiagnosticReport): string {
  const sp = pair.spread;
  if (!sp) return '';
  const xLabels = report.data.dates ?? report.data.rowLabels;
  const spread = lineChart({
    title: `Spread of ${pair.relation?.dependent ?? pair.a} against ${pair.relation?.regressor ?? pair.b}, on the least-squares line`,
    width: 860,
    height: 240,
    xLabels,
    lines: [{ values: sp.values, colour: PAIR_COLOURS.spread, label: 'spread' }],
    rules: [
      { y: sp.mean, colour: PAIR_COLOURS.mean, label: 'mean' },
      { y: sp.bandUpper, colour: PAIR_COLOURS.band, label: '+2 sd', dashed: true },
      { y: sp.bandLower, colour: PAIR_COLOURS.band, label: '-2 sd', dashed: true },
    ],
  });
  const rolling = lineChart({
    title: `Rolling z-score of the spread over ${sp.rollingWindow} rows`,
    width: 860,
    height: 200,
    xLabels,
    lines: [{ values: sp.rollingZ, colour: PAIR_COLOURS.zscore, label: `z-score, trailing ${sp.rollingWindow} ${report.data.period}s` }],
    rules: [
      { y: 0, colour: PAIR_COLOURS.zero, label: '0' },
      { y: 2, colour: PAIR_COLOURS.band, label: '+2', dashed: true },
      { y: -2, colour: PAIR_COLOURS.band, label: '-2', dashed: true },
    ],
  });
  return `<figure>${spread}${el('figcaption', `The spread: ${sp.definition}. Mean ${fixed4(sp.mean)}, standard deviation ${fixed4(sp.standardDeviation)}.`)}</figure>\n` +
    `<figure>${rolling}${el('figcaption', `How far the spread stands from its trailing ${sp.rollingWindow}-${report.data.period} mean, in trailing standard deviations.`)}</figure>`;
}

function details(pair: PairReport, report: DiagnosticReport): string {
  const out: string[] = [];
  const r = pair.relation;
  if (r) {
    const lines = [`${r.normalisationReason}`, `Least-squares line (the spread is built on it): beta ${formatStatistic(r.ols.beta)}, intercept ${formatStatistic(r.ols.intercept)}.`,
      `Dynamic OLS: beta ${formatStatistic(r.dynamicOls.beta)}, standard error ${formatStatistic(r.dynamicOls.standardError)} ${r.dynamicOls.standardErrorMethod}, ${r.dynamicOls.leadsLags} leads and lags, ${r.dynamicOls.observations} rows.`,
      `Hedge: ${r.hedgeText}.`];
    if (r.halves) {
      const h = r.halves;
      lines.push(`Halves: ${formatStatistic(h.first.beta)} (${h.first.from} to ${h.first.to}) and ${formatStatistic(h.second.beta)} (${h.second.from} to ${h.second.to}), ` +
        `${fixed1(h.differenceInStandardErrors)} standard errors apart: ${h.stable ? 'steady' : 'moved'}.`);
    } else if (r.halvesNote) lines.push(r.halvesNote);
    out.push(`<h4>Long-run relation</h4><ul>${lines.map((l) => el('li', l)).join('')}</ul>`);
  }
  const adj = pair.adjustment;
  if (adj) {
    const side = (s: typeof adj.ecm.dependent): string[] => [s.series, fixed4(s.speed), fixed4(s.standardError), formatPValue(s.pValue), s.corrects ? 'yes' : 'no'];
    out.push(`<h4>Who closes the gap (error-correction model, ${adj.ecm.lags} lagged change${adj.ecm.lags === 1 ? '' : 's'})</h4>` +
      htmlTable(['series', 'speed', 'std. error', 'p-value', 'closes the gap'], [side(adj.ecm.dependent), side(adj.ecm.regressor)]) +
      el('p', `Half-life: ${adj.spreadAr1.halfLife === null ? (adj.spreadAr1.halfLifeNote ?? 'none') : `${fixed1(adj.spreadAr1.halfLife)} ${report.data.period}s`}, ` +
        `${adj.spreadAr1.definition} (AR(1) coefficient ${formatStatistic(adj.spreadAr1.phi)}). ` +
        `Half-life interval: ${adj.spreadAr1.halfLifeInterval.text} (${adj.spreadAr1.halfLifeInterval.method}). ` +
        `Half-life implied by the error-correction model, both prices adjusting: ${adj.ecm.ecmHalfLife === null ? (adj.ecm.ecmHalfLifeNote ?? 'none') : `${fixed1(adj.ecm.ecmHalfLife)} ${report.data.period}s`}.`, 'note'));
  }
  return out.join('\n');
}

/** The hedge ratio through time: the Kalman filter's path with its band against the fixed least-squares ratio. */
function movingHedgeSection(pair: PairReport, report: DiagnosticReport): string {
  const m = pair.movingHedge;
  if (!m) return '';
  const chart = lineChart({
    title: `Hedge ratio of ${m.dependent} on ${m.regressor} through time (Kalman filter)`,
    width: 860,
    height: 240,
    xLabels: report.data.dates ?? report.data.rowLabels,
    lines: [
      { values: m.betaSmoothedLow, colour: PAIR_COLOURS.smoothedBand, label: 'smoothed, 95% band (low)' },
      { values: m.betaSmoothedHigh, colour: PAIR_COLOURS.smoothedBand, label: 'smoothed, 95% band (high)' },
      { values: m.beta, colour: PAIR_COLOURS.filtered, label: 'filtered (rows up to each)' },
      { values: m.betaSmoothed, colour: PAIR_COLOURS.spread, label: 'smoothed (every row)' },
    ],
    rules: [{ y: m.fixedBeta, colour: PAIR_COLOURS.band, label: 'fixed least-squares ratio', dashed: true }],
  });
  const variances = `Q = ${m.stateVar.toPrecision(4)}, R = ${m.obsVar.toPrecision(4)} by maximum likelihood (exact diffuse log-likelihood ${formatStatistic(m.logLikelihood)}); the first ${m.diffuseRows} rows set the filter up.`;
  return '<h4>The hedge ratio through time</h4>' +
    `<figure>${chart}${el('figcaption', `${m.latest.text.charAt(0).toUpperCase()}${m.latest.text.slice(1)}. ${m.driftText}`)}</figure>` +
    el('p', `${m.assumptions} ${m.driftMeaning} ${variances}`, 'note') +
    (m.warnings.length > 0 ? `<ul class="warnings">${m.warnings.map((w) => el('li', w)).join('')}</ul>` : '');
}

/** Where the pair is heading: the recent spread (Johansen relation) and its forecast path with the 95% band, and the series' forecasts. */
function forecastHtml(pair: PairReport, report: DiagnosticReport): string {
  const f = pair.forecast;
  if (!f) return '';
  const s = f.spread;
  const past = (report.data.dates ?? report.data.rowLabels).slice(s.recentFrom, s.recentFrom + s.recent.length);
  const ahead = f.dates ?? s.path.map((_, h) => `+${h + 1}`);
  const blank = (k: number) => new Array<number | null>(k).fill(null);
  const chart = lineChart({
    title: `Spread of the Johansen relation ${s.text}: recent rows and the forecast ${f.horizon} rows ahead`,
    width: 860,
    height: 240,
    xLabels: [...past, ...ahead],
    lines: [
      { values: [...s.recent, ...blank(f.horizon)], colour: PAIR_COLOURS.spread, label: 'spread' },
      { values: [...blank(s.recent.length), ...s.path], colour: PAIR_COLOURS.filtered, label: 'forecast' },
      { values: [...blank(s.recent.length), ...s.lower], colour: PAIR_COLOURS.smoothedBand, label: '95% band (low)' },
      { values: [...blank(s.recent.length), ...s.upper], colour: PAIR_COLOURS.smoothedBand, label: '95% band (high)' },
    ],
    rules: [{ y: s.mean, colour: PAIR_COLOURS.mean, label: 'equilibrium (mean over the fit)' }],
  });
  const last = f.horizon - 1;
  const rows = f.series.map((name, i) => [name, formatStatistic(f.forecast[last][i]), formatStatistic(f.lower[last][i]), formatStatistic(f.upper[last][i])]);
  return `<h4>Where it is heading (error-correction forecast, ${f.horizon} rows ahead${f.dates ? `, to ${f.dates[last]}` : ''})</h4>` +
    `<figure>${chart}${el('figcaption', `The model: ${f.rank} long-run relation, case ${f.case}, ${f.lags} lagged change${f.lags === 1 ? '' : 's'}. ${f.bandNote}`)}</figure>` +
    htmlTable(['series', `forecast, ${f.dates ? f.dates[last] : `row +${f.horizon}`}`, 'low (95%)', 'high (95%)'], rows, [0]);
}

/** The article of one pair. */
export function renderPairHtml(pair: PairReport, report: DiagnosticReport, anchor: string): string {
  const c = pair.cointegration;
  const status = statusOf(pair);
  const level = `at ${Number((report.settings.alpha * 100).toPrecision(6))}%`;
  const tests = [
    testCells('Engle-Granger tau', `${c.engleGranger.aOnB.dependent} on ${c.engleGranger.aOnB.regressor}`, c.engleGranger.aOnB),
    testCells('Engle-Granger tau', `${c.engleGranger.bOnA.dependent} on ${c.engleGranger.bOnA.regressor}`, c.engleGranger.bOnA),
  ];
  if (c.phillipsOuliaris) tests.push(testCells('Phillips-Ouliaris Z-t', pair.relation ? `${pair.relation.dependent} on ${pair.relation.regressor}` : `${pair.a} on ${pair.b}`, c.phillipsOuliaris));
  if (c.johansen) c.johansen.trace.forEach((t, r) => tests.push(testCells(`Johansen trace, r = ${r}`, `${c.johansen?.case}, K = ${c.johansen?.lags}`, t)));
  const parts = [
    `<article class="pair" id="${escapeHtml(anchor)}">`,
    `<h3>${escapeHtml(`${pair.a} and ${pair.b}`)} <span class="${status.className}">${escapeHtml(status.text)}</span></h3>`,
    `<ul class="verdicts">${pair.verdicts.map((v) => el('li', v)).join('')}</ul>`,
    c.cointegrated ? keyFigures(pair, report.data.period) : '',
    c.cointegrated ? charts(pair, report) : '',
    `<h4>Cointegration tests</h4>`,
    htmlTable(['test', 'which way / case', 'statistic', 'p-value', level], tests, [0, 1, 4]),
    c.johansen ? el('p', `${c.johansen.caseReason} ${c.johansen.lagsReason}`, 'note') : '',
  ];
  if (pair.leadLag) {
    const ll = pair.leadLag;
    parts.push('<h4>Lead-lag</h4>', htmlTable(['test', 'question', 'statistic', 'p-value', level], leadLagRows(pair), [0, 1, 4]),
      el('p', `${ll.why} Lags: ${leadLagLags(pair)}.`, 'note'));
  }
  if (c.cointegrated) parts.push(details(pair, report));
  if (c.cointegrated) parts.push(movingHedgeSection(pair, report), forecastHtml(pair, report));
  if (pair.warnings.length > 0) parts.push(`<h4>Warnings</h4><ul class="warnings">${pair.warnings.map((w) => el('li', w.text)).join('')}</ul>`);
  parts.push('</article>');
  return parts.filter((p) => p !== '').join('\n');
}
