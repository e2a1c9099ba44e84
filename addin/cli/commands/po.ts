/** `mooring po`: the Phillips-Ouliaris Z-t and Z-alpha cointegration tests of --y on --x. */
import { phillipsOuliaris } from '../../cointegration/phillips-ouliaris';
import type { Command } from '../command';
import { labelled } from '../render/format';
import { renderTestTerminal } from '../render/test-terminal';
import { testResultJson } from '../render/test-json';
import { ALL_DETERMINISTIC, BANDWIDTH_OPTION, deterministicOption, readBandwidth, readDeterministic } from '../test-options';
import { relationFromContext, relationJson, relationSampleTerminal, XS_OPTION, Y_OPTION } from './relation-input';

/** The po command. */
export const poCommand: Command = {
  name: 'po',
  summary: 'Phillips-Ouliaris cointegration tests (Z-t and Z-alpha) of one series on others',
  description: [
    'The same first step as mooring eg; the residual is then tested as in Phillips-Perron: a first-order autoregression ' +
      'with a long-run-variance correction instead of lagged differences.',
    'The headline statistic is Z-t; Z-alpha and its p-value are reported beside it.',
  ],
  usage: 'mooring po <file.csv> --y NAME --x NAME[,NAME...] [options]',
  options: [Y_OPTION, XS_OPTION, deterministicOption(ALL_DETERMINISTIC), BANDWIDTH_OPTION],
  examples: ['mooring po prices.csv --y Diesel --x Gasoil --log', 'mooring po prices.csv --y Diesel --x Gasoil --bandwidth 8 --json'],
  run(context) {
    const deterministic = readDeterministic(context.args, ALL_DETERMINISTIC, 'const');
    const bandwidth = readBandwidth(context.args);
    const input = relationFromContext(context, false);
    const result = phillipsOuliaris(input.y.series.values, input.xs.map((s) => s.series.values), { deterministic, bandwidth }, input.names);
    const body = testResultJson(result.test);
    return {
      terminal: `${renderTestTerminal(result.test)}\n\n${labelled('Verdict', result.verdict)}\n\n${relationSampleTerminal(input)}`,
      json: {
        ...relationJson(input),
        ...body,
        zt: body.statistic,
        zAlpha: result.zAlpha,
        zAlphaPValue: result.zAlphaPValue,
        zAlphaCritical: result.zAlphaCritical,
        beta: result.beta,
        intercept: result.intercept,
        trendCoefficient: result.trendCoefficient,
        verdict: result.verdict,
      },
    };
  },
};
