/**
 * The walk through the diagnostic, in order: pick the data, each stage of the diagnosis,
 * then write the results block. Names are plain words of our own; each step says in one
 * line what it is for.
 */

/** Identifier of a step. */
export type StepId = 'data' | 'series' | 'tied' | 'relation' | 'leader' | 'write';

/** One step of the walk. */
export interface StepInfo {
  id: StepId;
  title: string;
  /** The step's name on the strip: one or two words, shown beside its number. */
  short: string;
  /** One line: what this step answers. */
  purpose: string;
  /** Whether the step needs a finished diagnosis. */
  needsReport: boolean;
}

/** The steps, in reading order. */
export const STEPS: readonly StepInfo[] = [
  { id: 'data', title: 'Choose prices', short: 'Prices', purpose: 'Pick the table, the series to compare and the rows to use.', needsReport: false },
  { id: 'series', title: 'How each series moves', short: 'Series', purpose: 'Does each price wander, or keep coming back to a fixed level?', needsReport: true },
  { id: 'tied', title: 'Tied together?', short: 'Tied?', purpose: 'Do two wandering prices stay tied by a long-run relation?', needsReport: true },
  { id: 'relation', title: 'The relation and its pull', short: 'Relation', purpose: 'How the prices line up, how fast a gap closes, and where the gap is now.', needsReport: true },
  { id: 'leader', title: 'Who moves first', short: 'Leader', purpose: 'Does one price move before the other?', needsReport: true },
  { id: 'write', title: 'Put it in the sheet', short: 'To sheet', purpose: 'Write the results block into the workbook.', needsReport: true },
];

/** Position of a step in the walk (0-based). */
export function stepIndex(id: StepId): number {
  return STEPS.findIndex((s) => s.id === id);
}
