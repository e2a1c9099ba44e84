/** `mooring order`: the order of integration of one series, from ADF and KPSS together. */
import { integrationOrder } from '../../unitroot/integration-order';
import type { Command } from '../command';
import { levelValue } from '../option-values';
import { orderResultJson } from '../render/order-json';
import { renderOrderTerminal } from '../render/order-terminal';
import { renderSampleTerminal, sampleJson } from '../render/sample';
import { seriesFromContext } from '../series-input';
import { ALL_DETERMINISTIC, deterministicOption, readDeterministic, readUnitRootTest, UNIT_ROOT_OPTION } from '../test-options';

/** The order command. */
export const orderCommand: Command = {
  name: 'order',
  summary: 'order of integration, I(0), I(1) or I(2), by ADF and KPSS together',
  description: [
    'Decides how many times the series must be differenced before it looks stationary. ADF runs on the second ' +
      'differences, then the first, then the levels, stopping at the first unit root it cannot reject; KPSS checks the answer.',
    'Cointegration analysis needs series of the same order, usually I(1).',
  ],
  usage: 'mooring order <file.csv> --series NAME [options]',
  options: [
    deterministicOption(ALL_DETERMINISTIC),
    { name: 'alpha', value: 'LEVEL', help: 'significance level of each test, such as 0.05 (the default) or 1%' },
    UNIT_ROOT_OPTION,
  ],
  examples: ['mooring order prices.csv --series Crude --log'],
  run(context) {
    const deterministic = readDeterministic(context.args, ALL_DETERMINISTIC, 'const');
    const alpha = levelValue('alpha', context.args.values.get('alpha')) ?? 0.05;
    const unitRootTest = readUnitRootTest(context.args);
    const input = seriesFromContext(context);
    const result = integrationOrder(input.series.values, { deterministic, alpha, unitRootTest }, input.label);
    return {
      terminal: `${renderOrderTerminal(result)}\n\n${renderSampleTerminal(input.sample)}`,
      json: { series: input.label, sample: sampleJson(input.sample), alpha, unitRootTest, ...orderResultJson(result) },
    };
  },
};
