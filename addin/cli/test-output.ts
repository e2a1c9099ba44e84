/** The output of a command that runs one test on one series: sample lines, the result block, the JSON fields. */
import type { TestResult } from '../result';
import type { CommandOutput } from './command';
import { renderSampleTerminal, sampleJson } from './render/sample';
import { renderTestTerminal } from './render/test-terminal';
import { testResultJson } from './render/test-json';
import type { SeriesInput } from './series-input';

/** Terminal and JSON output for one test result; `extraJson` adds command-specific fields. */
export function singleTestOutput(input: SeriesInput, result: TestResult, extraJson: Record<string, unknown> = {}): CommandOutput {
  return {
    terminal: `${renderTestTerminal(result)}\n\n${renderSampleTerminal(input.sample)}`,
    json: { series: input.label, sample: sampleJson(input.sample), ...testResultJson(result), ...extraJson },
  };
}
