/** `mooring eg`: the Engle-Granger two-step cointegration test of --y on --x. */
import { engleGranger } from '../../cointegration/engle-granger';
import type { Command } from '../command';
import { labelled } from '../render/format';
import { renderTestTerminal } from '../render/test-terminal';
import { testResultJson } from '../render/test-json';
import { ALL_DETERMINISTIC, deterministicOption, LAGS_OPTION, MAX_LAGS_OPTION, readDeterministic, readLags } from '../test-options';
import { relationFromContext, relationJson, relationSampleTerminal, XS_OPTION, Y_OPTION } from './relation-input';

/** The eg command. */
export const egCommand: Command = {
  name: 'eg',
  summary: 'Engle-Granger cointegration test of one series on one or more others',
  description: [
    'Regresses --y on the --x series (with a constant by default), then runs a Dickey-Fuller test on the residual. ' +
      'A small p-value is evidence that the series are cointegrated: the residual, y minus the fitted combination, is stationary.',
    'p-values and critical values come from the tables for residuals with that many series, not from the unit-root tables. ' +
      'The lag rules are those of mooring adf.',
  ],
  usage: 'mooring eg <file.csv> --y NAME --x NAME[,NAME...] [options]',
  options: [Y_OPTION, XS_OPTION, deterministicOption(ALL_DETERMINISTIC), LAGS_OPTION, MAX_LAGS_OPTION],
  examples: ['mooring eg prices.csv --y Diesel --x Gasoil --log', 'mooring eg prices.csv --y Diesel --x Gasoil,Freight --lags 2 --json'],
  run(context) {
    const deterministic = readDeterministic(context.args, ALL_DETERMINISTIC, 'const');
    const lagChoice = readLags(context.args);
    const input = relationFromContext(context, false);
    const result = engleGranger(input.y.series.values, input.xs.map((s) => s.series.values), { deterministic, ...lagChoice }, input.names);
    return {
      terminal: `${renderTestTerminal(result.test)}\n\n${labelled('Verdict', result.verdict)}\n\n${relationSampleTerminal(input)}`,
      json: {
        ...relationJson(input),
        ...testResultJson(result.test),
        beta: result.beta,
        intercept: result.intercept,
        trendCoefficient: result.trendCoefficient,
        rSquared: result.rSquared,
        verdict: result.verdict,
      },
    };
  },
};
