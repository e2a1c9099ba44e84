/**
 * `mooring breaks`: one break at an unknown date. With --series, the Zivot-Andrews (1992)
 * unit-root test that lets the level, the trend slope or both shift once; with --y and --x,
 * the Gregory-Hansen (1996) cointegration test that lets the relation shift once. Dates in
 * the file name the break.
 */
import { zivotAndrewsTest } from '../../breaks/zivot-andrews';
import { gregoryHansenTest } from '../../breaks/gregory-hansen';
import { GREGORY_HANSEN_MODELS } from '../../tables/gregory-hansen-table';
import { ZIVOT_ANDREWS_BREAKS } from '../../breaks/zivot-andrews-design';
import { csvRowLabel } from '../../csv/csv-series';
import { MooringInputError } from '../../errors';
import type { Command } from '../command';
import { choiceValue } from '../option-values';
import { renderTestTerminal } from '../render/test-terminal';
import { testResultJson } from '../render/test-json';
import { seriesFromContext } from '../series-input';
import { singleTestOutput } from '../test-output';
import { LAGS_OPTION, MAX_LAGS_OPTION, readLags } from '../test-options';
import { relationFromContext, relationJson, relationSampleTerminal, X_OPTION, Y_OPTION } from './relation-input';

const MODEL_WORDS = [...new Set([...ZIVOT_ANDREWS_BREAKS, ...GREGORY_HANSEN_MODELS])];

/** --trim: a share strictly between 0 and 0.5; the engine checks the range. */
function trimValue(raw: string | undefined): number | undefined {
  if (raw === undefined) return undefined;
  const t = raw.trim();
  if (!/^(0?\.\d+|0)$/.test(t)) throw new MooringInputError(`--trim must be a share such as 0.15, not '${raw}'.`);
  return Number(t);
}

/** The breaks command. */
export const breaksCommand: Command = {
  name: 'breaks',
  summary: 'one break at an unknown date: in a series (unit root) or in a pair (cointegration)',
  description: [
    'With --series: tests for a unit root while allowing the series one break at a date the test finds (Zivot-Andrews). ' +
      '--model level lets the level shift (the default), slope the trend slope, both the two together.',
    'With --y and --x: tests for cointegration while allowing the relation one shift at a date the test finds (Gregory-Hansen). ' +
      '--model level shifts the intercept (the default), level-trend adds a trend, regime shifts the intercept and the hedge ratio.',
    'A break date found in the data is an estimate: a relation that broke once can break again.',
  ],
  usage: 'mooring breaks <file.csv> (--series NAME | --y NAME --x NAME) [options]',
  options: [
    Y_OPTION,
    X_OPTION,
    { name: 'model', value: MODEL_WORDS.join('|'), help: 'what may break (default level): level|slope|both for a series, level|level-trend|regime for a pair' },
    { name: 'trim', value: 'SHARE', help: 'share of the sample at each end where no break is sought (default 0.15)' },
    LAGS_OPTION,
    MAX_LAGS_OPTION,
  ],
  examples: ['mooring breaks prices.csv --series Crude --log --model both', 'mooring breaks prices.csv --y Diesel --x Gasoil --model regime --json'],
  run(context) {
    const modelWord = choiceValue('model', context.args.values.get('model'), MODEL_WORDS) ?? 'level';
    const trim = trimValue(context.args.values.get('trim'));
    const lagChoice = readLags(context.args);
    const pair = context.args.values.has('y') || context.args.values.has('x');
    const label = csvRowLabel(context.table);
    if (!pair) {
      if (!(ZIVOT_ANDREWS_BREAKS as readonly string[]).includes(modelWord)) {
        throw new MooringInputError(`--model ${modelWord} is for a pair; for one series use ${ZIVOT_ANDREWS_BREAKS.join(', ')}.`);
      }
      const input = seriesFromContext(context);
      const rows = input.series.rows;
      const result = zivotAndrewsTest(input.series.values, { model: modelWord as (typeof ZIVOT_ANDREWS_BREAKS)[number], trim, ...lagChoice, rowLabel: (i) => label(rows[i]) }, input.label);
      // the verdict is printed once, among the details ('Verdict at 5%')
      return singleTestOutput(input, result, { breakAt: result.breakAt, verdict: result.verdict });
    }
    if (!(GREGORY_HANSEN_MODELS as readonly string[]).includes(modelWord)) {
      throw new MooringInputError(`--model ${modelWord} is for one series; for a pair use ${GREGORY_HANSEN_MODELS.join(', ')}.`);
    }
    const input = relationFromContext(context, true);
    const rows = input.y.series.rows;
    const result = gregoryHansenTest(
      input.y.series.values,
      [input.xs[0].series.values],
      { model: modelWord as (typeof GREGORY_HANSEN_MODELS)[number], trim, ...lagChoice, rowLabel: (i) => label(rows[i]) },
      { y: input.names.y, xs: input.names.xs },
    );
    return {
      terminal: `${renderTestTerminal(result)}\n\n${relationSampleTerminal(input)}`,
      json: { ...relationJson(input), ...testResultJson(result), breakAt: result.breakAt, relation: result.relation, verdict: result.verdict },
    };
  },
};
