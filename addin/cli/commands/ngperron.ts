/** `mooring ngperron`: the four Ng-Perron (2001) unit-root statistics on one series. */
import { ngPerronTest } from '../../unitroot/ng-perron';
import type { Command } from '../command';
import { GLS_OPTIONS, readGlsOptions } from '../gls-options';
import { seriesFromContext } from '../series-input';
import { singleTestOutput } from '../test-output';

const finite = (v: number) => (Number.isFinite(v) ? v : null);

/** The ngperron command. */
export const ngperronCommand: Command = {
  name: 'ngperron',
  summary: 'Ng-Perron unit-root tests MZa, MZt, MSB, MPT on the GLS-detrended series',
  description: [
    'Four unit-root statistics of Ng & Perron (2001) on the series detrended by GLS, with the long-run variance from an ' +
      'autoregression whose lags the modified AIC chooses. They keep their size where the errors have a negative ' +
      'moving-average part, which makes adf reject too often, and keep the power of GLS detrending. Small values reject.',
    'MZa is the headline; all four are given with their p-values and the critical values of the same simulated ' +
      'limits the p-values come from, and in JSON beside them (publishedCritical) the asymptotic values of Ng & Perron ' +
      '(2001), Table 1, as recalled (not read from the page).',
  ],
  usage: 'mooring ngperron <file.csv> --series NAME [options]',
  options: GLS_OPTIONS,
  examples: ['mooring ngperron prices.csv --series Crude --log --json'],
  run(context) {
    const options = readGlsOptions(context.args);
    const input = seriesFromContext(context);
    const result = ngPerronTest(input.series.values, options, input.label);
    const s = result.statistics;
    const each = (name: keyof typeof s) => ({
      statistic: finite(s[name].statistic),
      pValue: finite(s[name].pValue),
      pValueBound: s[name].pValueBound,
      critical: s[name].critical,
      publishedCritical: s[name].publishedCritical,
    });
    return singleTestOutput(input, result, {
      MZa: finite(s.MZa.statistic),
      MZt: finite(s.MZt.statistic),
      MSB: finite(s.MSB.statistic),
      MPT: finite(s.MPT.statistic),
      statistics: { MZa: each('MZa'), MZt: each('MZt'), MSB: each('MSB'), MPT: each('MPT') },
    });
  },
};
