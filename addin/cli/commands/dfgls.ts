/** `mooring dfgls`: the DF-GLS unit-root test (Elliott, Rothenberg & Stock 1996) on one series. */
import { dfglsTest } from '../../unitroot/dfgls';
import type { Command } from '../command';
import { GLS_OPTIONS, readGlsOptions } from '../gls-options';
import { seriesFromContext } from '../series-input';
import { singleTestOutput } from '../test-output';

/** The dfgls command. */
export const dfglsCommand: Command = {
  name: 'dfgls',
  summary: 'DF-GLS unit-root test: ADF on the series detrended by GLS, more power',
  description: [
    'Tests whether the series has a unit root against the alternative that it is stationary, like adf, but first removes ' +
      'the constant (or constant and trend) by GLS on quasi-differences (Elliott, Rothenberg & Stock 1996). Against series ' +
      'that revert slowly it rejects a false unit root far more often than adf at the same size.',
    'Lagged differences are chosen by the modified AIC of Ng & Perron (2001) unless --lags says otherwise. Critical values ' +
      'and the p-value come from Mooring\'s own seeded simulation at the sample\'s size.',
  ],
  usage: 'mooring dfgls <file.csv> --series NAME [options]',
  options: GLS_OPTIONS,
  examples: ['mooring dfgls prices.csv --series Crude --log', 'mooring dfgls prices.csv --series Crude --deterministic trend --lags aic --json'],
  run(context) {
    const options = readGlsOptions(context.args);
    const input = seriesFromContext(context);
    return singleTestOutput(input, dfglsTest(input.series.values, options, input.label));
  },
};
