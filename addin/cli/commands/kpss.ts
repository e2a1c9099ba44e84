/** `mooring kpss`: the KPSS stationarity test on one series. */
import { kpssTest } from '../../unitroot/kpss';
import type { Command } from '../command';
import { seriesFromContext } from '../series-input';
import { BANDWIDTH_OPTION, deterministicOption, readBandwidth, readDeterministic } from '../test-options';
import { singleTestOutput } from '../test-output';

const KPSS_DETERMINISTIC = ['const', 'trend'] as const;

/** The kpss command. */
export const kpssCommand: Command = {
  name: 'kpss',
  summary: 'KPSS stationarity test on one series (the null is the reverse of adf)',
  description: [
    'Tests whether the series is stationary around a constant level (or around a linear trend with --deterministic trend). ' +
      'A statistic above the critical value, or a small p-value, is evidence of a unit root.',
    'Run it beside adf: the two tests start from opposite nulls, so agreement between them is stronger evidence than either alone.',
  ],
  usage: 'mooring kpss <file.csv> --series NAME [options]',
  options: [deterministicOption([...KPSS_DETERMINISTIC]), BANDWIDTH_OPTION],
  examples: ['mooring kpss prices.csv --series Crude --log', 'mooring kpss prices.csv --series Crude --bandwidth 8'],
  run(context) {
    const deterministic = readDeterministic(context.args, KPSS_DETERMINISTIC, 'const');
    const bandwidth = readBandwidth(context.args);
    const input = seriesFromContext(context);
    const result = kpssTest(input.series.values, { deterministic, bandwidth }, input.label);
    return singleTestOutput(input, result);
  },
};
