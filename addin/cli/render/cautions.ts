/**
 * The cautions every report ends with. Results of these tests feed trading decisions, so the
 * terminal report closes with them in short form and the JSON object carries them as a list.
 */
import { bullet } from './format';

/** The cautions, one sentence each. */
export const CAUTIONS: readonly string[] = [
  'A test result is statistical evidence, not advice to trade.',
  'Relations that held in past prices can break without warning.',
  'Screening many series or pairs turns up some that pass by chance alone (false discoveries).',
  'Your own risk policy and licensed financial advice come first.',
];

/** The cautions as the closing block of a terminal report. */
export function renderCautions(): string {
  return ['Keep in mind', ...CAUTIONS.map((c) => bullet(c))].join('\n');
}
