/**
 * `mooring granger`: does --cause lead --effect? The lead-lag test valid for the pair (leadLag):
 * by default the orders of integration (ADF and KPSS) and --cointegrated choose between the F test
 * on values or changes, Toda-Yamamoto and the error-correction form; --method asks for one, and
 * --data levels|changes asks for the F test on the values as given or on their changes.
 * The headline is the --cause -> --effect direction; the reverse direction is summarised too.
 */
import { LEAD_LAG_DATA, leadLag, type LeadLagMethod } from '../../causality/lead-lag';
import type { LeadLagDirection } from '../../causality/lead-lag';
import type { TestResult } from '../../result';
import { MooringInputError } from '../../errors';
import type { Command } from '../command';
import { choiceValue, countOrWordValue, levelValue, wholeNumberValue } from '../option-values';
import { bullet, labelled } from '../render/format';
import { renderSampleTerminal, sampleJson } from '../render/sample';
import { renderTestTerminal } from '../render/test-terminal';
import { finiteOrNull, testResultJson } from '../render/test-json';
import { blockFromContext } from '../series-input';

const METHOD_WORDS = ['auto', 'f', 'ty', 'ecm'] as const;
const YES_NO = ['yes', 'no'] as const;

function detailNumber(result: TestResult, key: string): number | null {
  const d = result.details.find((x) => x.key === key);
  return typeof d?.value === 'number' ? finiteOrNull(d.value) : null;
}

/** The JSON fields of one direction: the F form (or null), its degrees of freedom and, for the F tests, the other two forms. */
function directionJson(d: LeadLagDirection): Record<string, unknown> {
  const t = d.test;
  const isF = t.statisticName === 'F';
  const out: Record<string, unknown> = {
    cause: d.cause,
    effect: d.effect,
    leads: d.leads,
    fStatistic: isF ? finiteOrNull(t.statistic) : null,
    pValue: finiteOrNull(t.pValue),
    df: isF ? [detailNumber(t, 'dfNumerator'), detailNumber(t, 'dfDenominator')] : [detailNumber(t, 'df'), null],
  };
  if (d.method === 'f-levels' || d.method === 'f-differences') {
    out.chiSquare = { statistic: detailNumber(t, 'chiSquare'), pValue: detailNumber(t, 'chiSquarePValue'), df: t.lags };
    out.likelihoodRatio = { statistic: detailNumber(t, 'likelihoodRatio'), pValue: detailNumber(t, 'likelihoodRatioPValue'), df: t.lags };
  }
  if (d.method === 'toda-yamamoto') {
    out.waldChiSquare = { statistic: finiteOrNull(t.statistic), pValue: finiteOrNull(t.pValue), df: t.lags };
    out.extraLags = detailNumber(t, 'extraLags');
  }
  if (d.longRun !== null) {
    out.longRun = { statistic: finiteOrNull(d.longRun.statistic), pValue: finiteOrNull(d.longRun.pValue), adjustment: detailNumber(d.longRun, 'adjustment') };
  }
  return out;
}

/** The granger command. */
export const grangerCommand: Command = {
  name: 'granger',
  summary: 'lead-lag (Granger causality) test: does one series help predict another?',
  description: [
    "Tests whether --cause's past helps predict --effect beyond --effect's own past. The test is chosen to be valid for the data: " +
      'the F test on the values for stationary series, on the changes for wandering (I(1)) series that are not cointegrated, ' +
      'the error-correction form for a cointegrated pair, and Toda-Yamamoto when the orders differ or are uncertain.',
    '--method f, ty or ecm asks for the F test, Toda-Yamamoto or the error-correction form instead. The reverse direction is run too and summarised. ' +
      'A lead is evidence about past data, not a forecast or trading advice.',
    '--data says which data the F test uses: auto (the default) runs it on the changes when both series wander (I(1)) and on the values otherwise; ' +
      'levels is the plain F test on the values as given, to reproduce a textbook or a colleague\'s number (on wandering prices its p-values ' +
      'can be far too small, and the output says so); changes forces first differences. The JSON field data says which were used.',
  ],
  usage: 'mooring granger <file.csv> --cause NAME --effect NAME [options]',
  options: [
    { name: 'cause', value: 'NAME', help: 'the series that may lead' },
    { name: 'effect', value: 'NAME', help: 'the series that may follow' },
    { name: 'lags', value: 'N|aic|bic', help: 'lags of both series, or the VAR criterion that picks them (default aic; at least 1)' },
    { name: 'max-lags', value: 'N', help: 'largest lag the criterion may pick (default 12 (n/100)^(1/4), capped by the sample)' },
    { name: 'method', value: 'auto|f|ty|ecm', help: 'which test: auto (the valid one, default), f, ty (Toda-Yamamoto) or ecm (error correction)' },
    { name: 'data', value: 'auto|levels|changes', help: 'data of the F test: auto (changes when both series wander, default), levels (the values as given) or changes' },
    { name: 'cointegrated', value: 'yes|no', help: 'whether the pair is cointegrated (e.g. from mooring eg); unknown when left out' },
    { name: 'alpha', value: 'LEVEL', help: 'level of the verdict and the unit-root tests, such as 0.05 (the default) or 1%' },
  ],
  examples: [
    'mooring granger prices.csv --cause Gasoil --effect Diesel --log',
    'mooring granger prices.csv --cause Gasoil --effect Diesel --method ty --lags 2 --json',
    'mooring granger prices.csv --cause Gasoil --effect Diesel --method f --data levels --lags 4',
  ],
  run(context) {
    if (context.common.series !== undefined) {
      throw new MooringInputError('granger works on a pair: name its series with --cause and --effect instead of --series.');
    }
    const cause = context.args.values.get('cause');
    const effect = context.args.values.get('effect');
    if (cause === undefined || effect === undefined) {
      throw new MooringInputError('granger needs --cause NAME and --effect NAME: the series that may lead and the one that may follow.');
    }
    if (cause.trim().toLowerCase() === effect.trim().toLowerCase()) {
      throw new MooringInputError(`--cause and --effect both name '${cause}': a series cannot be tested against itself.`);
    }
    const lags = countOrWordValue('lags', context.args.values.get('lags'), 'lags', ['aic', 'bic'] as const) ?? 'aic';
    const maxLags = wholeNumberValue('max-lags', context.args.values.get('max-lags'), 'lags');
    if (typeof lags === 'number' && maxLags !== undefined) {
      throw new MooringInputError(`--max-lags applies only with --lags aic or bic; with --lags ${lags} leave it out.`);
    }
    const method: LeadLagMethod = choiceValue('method', context.args.values.get('method'), METHOD_WORDS) ?? 'auto';
    const data = choiceValue('data', context.args.values.get('data'), LEAD_LAG_DATA) ?? 'auto';
    const coint = choiceValue('cointegrated', context.args.values.get('cointegrated'), YES_NO);
    const alpha = levelValue('alpha', context.args.values.get('alpha')) ?? 0.05;
    const [x, y] = blockFromContext(context, [cause, effect]);
    const result = leadLag(x.series.values, y.series.values, {
      alpha,
      lags,
      maxLags,
      method,
      data,
      cointegrated: coint === undefined ? undefined : coint === 'yes',
    }, [x.label, y.label]);
    const main = result.aLeadsB;
    const reverse = result.bLeadsA;

    const terminal: string[] = [renderTestTerminal(main.test)];
    if (main.longRun !== null) terminal.push('', renderTestTerminal(main.longRun));
    terminal.push('', labelled('Test chosen', result.why), labelled('Verdict', result.verdict));
    if (result.cautions.length > 1) {
      terminal.push('', 'Cautions');
      for (const c of result.cautions.slice(1)) terminal.push(bullet(c, 2, '!'));
    }
    terminal.push('', renderSampleTerminal({ ...x.sample, column: `${x.series.name}, ${y.series.name}` }));

    return {
      terminal: terminal.join('\n'),
      json: {
        cause: x.label,
        effect: y.label,
        sample: sampleJson(x.sample),
        ...testResultJson(main.test),
        ...directionJson(main),
        method: result.method,
        data: result.data,
        dataRequested: data,
        why: result.why,
        alsoValid: result.alsoValid,
        orders: result.orders,
        alpha,
        reverse: directionJson(reverse),
        verdict: result.verdict,
        leadCautions: result.cautions,
      },
    };
  },
};
