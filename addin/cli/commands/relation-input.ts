/**
 * The series of a long-run relation for the cointegration commands (eg, po, hedge, ecm,
 * spread): --y names the dependent series, --x the regressor (or, for eg and po, several,
 * comma-separated). The columns are cleaned and lined up by row through the block reader, so
 * every series covers the same rows; --series is refused with a pointer to --y and --x.
 */
import { MooringInputError } from '../../errors';
import type { OptionSpec } from '../arguments';
import type { CommandContext } from '../command';
import { renderSampleTerminal, sampleJson } from '../render/sample';
import { blockFromContext, type SeriesInput } from '../series-input';

/** --y NAME. */
export const Y_OPTION: OptionSpec = { name: 'y', value: 'NAME', help: 'the dependent series: the left-hand side of the relation' };

/** --x NAME[,NAME...] for the tests that take several regressors. */
export const XS_OPTION: OptionSpec = { name: 'x', value: 'NAME[,NAME...]', help: 'the regressor series, several separated by commas' };

/** --x NAME for the pair commands. */
export const X_OPTION: OptionSpec = { name: 'x', value: 'NAME', help: 'the regressor series: the hedge leg' };

export interface RelationInput {
  y: SeriesInput;
  xs: SeriesInput[];
  /** Labels for the engine's names: ln(column) under --log. */
  names: { y: string; xs: string[] };
}

/** Reads --y and --x, cleans the columns and aligns them by row. `single` allows one x only. */
export function relationFromContext(context: CommandContext, single: boolean): RelationInput {
  if (context.common.series !== undefined) {
    throw new MooringInputError(`${context.command} works on a relation: name its series with --y and --x instead of --series.`);
  }
  const yName = context.args.values.get('y');
  const xText = context.args.values.get('x');
  if (yName === undefined || xText === undefined) {
    throw new MooringInputError(`${context.command} needs --y NAME and --x NAME${single ? '' : '[,NAME...]'}: the dependent series and the regressor${single ? '' : 's'}.`);
  }
  const xNames = xText.split(',').map((s) => s.trim());
  if (xNames.some((n) => n === '')) throw new MooringInputError(`--x has an empty name in '${xText}': separate the names with single commas.`);
  if (single && xNames.length > 1) throw new MooringInputError(`${context.command} takes one regressor; --x names ${xNames.length} (${xNames.join(', ')}).`);
  const all = [yName, ...xNames];
  const lower = all.map((n) => n.toLowerCase());
  const repeated = all.find((_, i) => lower.indexOf(lower[i]) !== i);
  if (repeated !== undefined) throw new MooringInputError(`'${repeated}' is named twice in --y and --x: each series may appear once.`);
  const [y, ...xs] = blockFromContext(context, all);
  return { y, xs, names: { y: y.label, xs: xs.map((s) => s.label) } };
}

/** The sample lines of a relation: the shared rows, with every column named. */
export function relationSampleTerminal(input: RelationInput): string {
  return renderSampleTerminal({ ...input.y.sample, column: [input.y, ...input.xs].map((s) => s.series.name).join(', ') });
}

/** The JSON fields that say which series and rows the command used. */
export function relationJson(input: RelationInput): Record<string, unknown> {
  return { y: input.names.y, x: input.names.xs, sample: sampleJson(input.y.sample) };
}
