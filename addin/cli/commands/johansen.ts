/**
 * `mooring johansen`: the Johansen rank test of a system of 2 to 12 series (johansenTest):
 * trace and maximum-eigenvalue statistics for every r with p-values and critical values,
 * the eigenvalues, the normalised relations (first series = 1) and the loadings.
 */
import { JOHANSEN_CASES } from '../../johansen/deterministic-case';
import { johansenTest } from '../../johansen/johansen';
import { betaRestrictionTest, exogeneityTests } from '../../johansen/restrictions';
import { MooringInputError } from '../../errors';
import type { Command } from '../command';
import { choiceValue, levelValue, wholeNumberValue } from '../option-values';
import { bullet, formatPValue, formatStatistic, heading, labelled } from '../render/format';
import { renderSampleTerminal, sampleJson } from '../render/sample';
import { finiteOrNull } from '../render/test-json';
import { blockFromContext, seriesList } from '../series-input';
import { plainTable } from './plain-table';

/** The johansen command. */
export const johansenCommand: Command = {
  name: 'johansen',
  summary: 'Johansen rank test of a system of series: how many long-run relations tie them',
  description: [
    'Estimates a vector error-correction model by reduced-rank regression and tests, for r = 0, 1, ..., how many ' +
      'long-run relations the series share (trace and maximum-eigenvalue statistics, with p-values from our simulated ' +
      'tables and critical values from the published ones where they exist).',
    "--case chooses the deterministic terms: none; restricted-constant (a constant inside the relations: prices that do not drift); " +
      'constant (the default: prices that drift); restricted-trend (a trend inside the relations); trend (trending changes).',
    '--lags K is the number of lagged changes (K = 1 by default). --small-sample scales the statistics by (n - mK\')/n (Reinsel & Ahn 1992).',
    '--beta-test 1,-1 tests whether the one long-run relation is the given weights up to scale ("is the spread simply A - B?"; ' +
      'likelihood ratio, chi-square with one degree of freedom fewer than the series). --exogeneity tests, for each series, ' +
      'whether it never moves to close the gap (its adjustment is zero; chi-square with as many degrees of freedom as relations, ' +
      'the rank chosen by the trace test, at least 1).',
  ],
  usage: 'mooring johansen <file.csv> --series A,B[,...] [options]',
  options: [
    { name: 'case', value: JOHANSEN_CASES.join('|'), help: 'deterministic terms (default constant)' },
    { name: 'lags', value: 'K', help: 'lagged changes in the model (default 1)' },
    { name: 'alpha', value: 'LEVEL', help: 'level for the sequential rank choice (default 0.05)' },
    { name: 'small-sample', help: 'apply the Reinsel-Ahn small-sample correction' },
    { name: 'beta-test', value: 'W1,W2[,...]', help: 'test that the relation is these weights, one per series, up to scale' },
    { name: 'exogeneity', help: 'test, for each series, that it never moves to close the gap' },
  ],
  examples: ['mooring johansen prices.csv --series Gasoil,Diesel,Freight --log', 'mooring johansen prices.csv --series Gasoil,Diesel --case restricted-constant --lags 2 --json', 'mooring johansen prices.csv --series Gasoil,Diesel --beta-test 1,-1 --exogeneity'],
  run(context) {
    const names = seriesList(context.common.series, 'johansen');
    const caseName = choiceValue('case', context.args.values.get('case'), JOHANSEN_CASES) ?? 'constant';
    const lags = wholeNumberValue('lags', context.args.values.get('lags'), 'lagged changes') ?? 1;
    const alpha = levelValue('alpha', context.args.values.get('alpha')) ?? 0.05;
    const block = blockFromContext(context, names);
    const labels = block.map((s) => s.label);
    const result = johansenTest(
      block.map((s) => s.series.values),
      { case: caseName, lags, alpha, smallSampleCorrection: context.args.switches.has('small-sample') },
      labels,
    );
    const options = { case: caseName, lags };
    const vectorText = context.args.values.get('beta-test');
    let vector: number[] | null = null;
    if (vectorText !== undefined) {
      vector = vectorText.split(',').map((v) => Number(v.trim()));
      if (vector.some((v, i) => vectorText.split(',')[i].trim() === '' || !Number.isFinite(v))) {
        throw new MooringInputError(`--beta-test needs one number per series, separated by commas (such as 1,-1), not '${vectorText}'.`);
      }
    }
    const betaTest = vector === null ? null : betaRestrictionTest(block.map((s) => s.series.values), vector, options, labels);
    const exogeneityRank = Math.min(Math.max(result.rank.trace, 1), labels.length - 1);
    const exogeneity = context.args.switches.has('exogeneity') ? exogeneityTests(block.map((s) => s.series.values), { ...options, rank: exogeneityRank }, labels) : null;
    const restrictionLines = [
      ...(betaTest === null ? [] : [
        '',
        `Is the relation ${vector!.map((v, i) => `${formatStatistic(v)} ${labels[i]}`).join(' + ')} (up to scale)?`,
        labelled('LR statistic', `${formatStatistic(betaTest.statistic)} (chi-square, ${betaTest.df} df)`),
        labelled('p-value', formatPValue(betaTest.pValue)),
        ...(result.rank.trace !== 1 ? [bullet(`The trace test chose ${result.rank.trace} relations; this test assumes exactly one.`)] : []),
      ]),
      ...(exogeneity === null ? [] : [
        '',
        `Who closes the gap? (each series' adjustment is zero; ${exogeneityRank} relation${exogeneityRank > 1 ? 's' : ''} assumed)`,
        ...plainTable(['series', 'LR', 'df', 'p', 'moves to close the gap?'], exogeneity.map((e) => [
          e.series, formatStatistic(e.statistic), String(e.df), formatPValue(e.pValue), e.pValue < alpha ? 'yes' : 'no sign of it',
        ])),
        ...(result.rank.trace === 0 ? [bullet('The trace test found no relation; the adjustment tests assume one.')] : []),
      ]),
    ];
    const rows = result.trace.map((t, r) => {
      const m = result.maxEigen[r];
      return [
        `r <= ${r}`,
        formatStatistic(result.eigenvalues[r]),
        formatStatistic(t.statistic),
        formatPValue(t.pValue, t.pValueBound),
        formatStatistic(t.critical['5%']),
        formatStatistic(m.statistic),
        formatPValue(m.pValue, m.pValueBound),
        formatStatistic(m.critical['5%']),
      ];
    });
    const bounded = [...result.trace, ...result.maxEigen].some((t) => t.pValueBound);
    const relations = result.beta[0].map((_, j) => `  relation ${j + 1}: ` + labels.map((name, i) => `${formatStatistic(result.beta[i][j])} ${name}`).join(' + '));
    const terminal = [
      heading(`Johansen rank test of ${labels.join(', ')}`),
      '',
      labelled('Deterministic case', caseName),
      labelled('Lagged changes (K)', String(result.lags)),
      labelled('Observations', String(result.nobs)),
      labelled('Rank (trace)', String(result.rank.trace)),
      labelled('Rank (max-eig)', String(result.rank.maxEigen)),
      '',
      ...plainTable(['H0', 'eigenvalue', 'trace', 'p', '5% crit', 'max-eig', 'p', '5% crit'], rows),
      ...(bounded ? ['', bullet('A p-value shown as "< 0.001" or "> 0.999" is a bound: the statistic lies beyond the simulated table, which gives p-values from 0.001 to 0.999.')] : []),
      '',
      'Relations (each column of beta, first series = 1):',
      ...relations,
      ...restrictionLines,
      '',
      ...[result.verdict, ...result.warnings].map((w) => bullet(w)),
      '',
      renderSampleTerminal({ ...block[0].sample, column: block.map((s) => s.series.name).join(', ') }),
    ];
    const critical = (c: Record<string, number>) => ({ '10%': finiteOrNull(c['10%']), '5%': finiteOrNull(c['5%']), '1%': finiteOrNull(c['1%']) });
    return {
      terminal: terminal.join('\n'),
      json: {
        series: labels,
        sample: sampleJson(block[0].sample),
        case: caseName,
        lags: result.lags,
        nobs: result.nobs,
        eigenvalues: result.eigenvalues.map(finiteOrNull),
        trace: result.trace.map((t) => finiteOrNull(t.statistic)),
        maxEigen: result.maxEigen.map((t) => finiteOrNull(t.statistic)),
        traceCritical: result.trace.map((t) => critical(t.critical)),
        maxEigenCritical: result.maxEigen.map((t) => critical(t.critical)),
        tracePValue: result.trace.map((t) => finiteOrNull(t.pValue)),
        maxEigenPValue: result.maxEigen.map((t) => finiteOrNull(t.pValue)),
        tracePValueNote: result.trace.map((t) => t.pValueNote ?? null),
        maxEigenPValueNote: result.maxEigen.map((t) => t.pValueNote ?? null),
        tracePValueBound: result.trace.map((t) => t.pValueBound ?? null),
        maxEigenPValueBound: result.maxEigen.map((t) => t.pValueBound ?? null),
        rank: result.rank.trace,
        rankByMaxEigen: result.rank.maxEigen,
        beta: result.beta,
        alpha: result.alpha,
        deterministicInRelation: result.deterministicInRelation ?? null,
        smallSampleFactor: result.smallSampleFactor,
        verdict: result.verdict,
        warnings: result.warnings,
        ...(betaTest === null ? {} : { betaTest: { vector, statistic: betaTest.statistic, df: betaTest.df, pValue: betaTest.pValue } }),
        ...(exogeneity === null ? {} : { exogeneity: exogeneity.map((e) => ({ series: e.series, statistic: e.statistic, df: e.df, pValue: e.pValue })), exogeneityRank }),
      },
    };
  },
};
