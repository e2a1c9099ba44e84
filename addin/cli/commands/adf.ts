/** `mooring adf`: the augmented Dickey-Fuller unit-root test on one series. */
import { adfTest } from '../../unitroot/adf';
import type { Command } from '../command';
import { seriesFromContext } from '../series-input';
import { ALL_DETERMINISTIC, deterministicOption, LAGS_OPTION, MAX_LAGS_OPTION, readDeterministic, readLags } from '../test-options';
import { singleTestOutput } from '../test-output';

/** The adf command. */
export const adfCommand: Command = {
  name: 'adf',
  summary: 'augmented Dickey-Fuller unit-root test on one series',
  description: [
    'Tests whether the series has a unit root (its shocks never fade) against the alternative that it is stationary. ' +
      'A statistic below the critical value, or a small p-value, is evidence against the unit root.',
    'Lagged differences soak up short-run correlation. By default AIC picks their number up to Schwert\'s maximum; ' +
      '--lags N fixes exactly N.',
  ],
  usage: 'mooring adf <file.csv> --series NAME [options]',
  options: [deterministicOption(ALL_DETERMINISTIC), LAGS_OPTION, MAX_LAGS_OPTION],
  examples: ['mooring adf prices.csv --series Crude --log', 'mooring adf prices.csv --series Crude --lags 4 --deterministic trend --json'],
  run(context) {
    const deterministic = readDeterministic(context.args, ALL_DETERMINISTIC, 'const');
    const lagChoice = readLags(context.args);
    const input = seriesFromContext(context);
    const result = adfTest(input.series.values, { deterministic, ...lagChoice }, input.label);
    return singleTestOutput(input, result);
  },
};
