/** `mooring pp`: the Phillips-Perron unit-root test on one series. */
import { phillipsPerronTest } from '../../unitroot/phillips-perron';
import type { Command } from '../command';
import { seriesFromContext } from '../series-input';
import { ALL_DETERMINISTIC, BANDWIDTH_OPTION, deterministicOption, readBandwidth, readDeterministic } from '../test-options';
import { singleTestOutput } from '../test-output';

/** The pp command. */
export const ppCommand: Command = {
  name: 'pp',
  summary: 'Phillips-Perron unit-root test on one series',
  description: [
    'Tests for a unit root like adf, but corrects the Dickey-Fuller statistic for serial correlation with a long-run ' +
      'variance (Bartlett kernel) instead of adding lagged differences. Reports Z-tau (the headline) and Z-alpha.',
  ],
  usage: 'mooring pp <file.csv> --series NAME [options]',
  options: [deterministicOption(ALL_DETERMINISTIC), BANDWIDTH_OPTION],
  examples: ['mooring pp prices.csv --series Crude --log --json'],
  run(context) {
    const deterministic = readDeterministic(context.args, ALL_DETERMINISTIC, 'const');
    const bandwidth = readBandwidth(context.args);
    const input = seriesFromContext(context);
    const result = phillipsPerronTest(input.series.values, { deterministic, bandwidth }, input.label);
    const detail = (key: string) => result.details.find((d) => d.key === key)?.value ?? null;
    const zAlpha = detail('zAlpha');
    const zAlphaPValue = detail('zAlphaPValue');
    return singleTestOutput(input, result, {
      zAlpha: typeof zAlpha === 'number' && Number.isFinite(zAlpha) ? zAlpha : null,
      zAlphaPValue: typeof zAlphaPValue === 'number' && Number.isFinite(zAlphaPValue) ? zAlphaPValue : null,
    });
  },
};
