/**
 * `mooring johansen`: the Johansen rank test of a system of 2 to 12 series (johansenTest):
 * trace and maximum-eigenvalue statistics for every r with p-values and critical values,
 * the eigenvalues, the normalised relations (first series = 1) and the loadings.
 */
import { JOHANSEN_CASES } from '../../johansen/deterministic-case';
import { johansenTest } from '../../johansen/johansen';
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
  ],
  usage: 'mooring johansen <file.csv> --series A,B[,...] [options]',
  options: [
    { name: 'case', value: JOHANSEN_CASES.join('|'), help: 'deterministic terms (default constant)' },
    { name: 'lags', value: 'K', help: 'lagged changes in the model (default 1)' },
    { name: 'alpha', value: 'LEVEL', help: 'level for the sequential rank choice (default 0.05)' },
    { name: 'small-sample', help: 'apply the Reinsel-Ahn small-sample correction' },
  ],
  examples: ['mooring johansen prices.csv --series Gasoil,Diesel,Freight --log', 'mooring johansen prices.csv --series Gasoil,Diesel --case restricted-constant --lags 2 --json'],
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
      },
    };
  },
};
