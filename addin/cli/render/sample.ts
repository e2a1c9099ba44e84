/** The sample lines at the top of a report, and the sample object of the JSON. */
import type { SampleInfo } from '../series-input';
import { labelled } from './format';

/** Most skipped rows listed by line in the terminal (the JSON lists them all). */
const LISTED = 5;

function lineWithDate(line: number, date: string | null): string {
  return date ? `line ${line} (${date})` : `line ${line}`;
}

/** "Data", "Sample" and "Skipped" lines for one series. */
export function renderSampleTerminal(sample: SampleInfo): string {
  const out = [
    labelled('Data', `${sample.file === '-' ? 'standard input' : sample.file}, column ${sample.column}${sample.logged ? ', natural logs' : ''}`),
    labelled('Sample', `${sample.observations} values, ${lineWithDate(sample.firstLine, sample.firstDate)} to ${lineWithDate(sample.lastLine, sample.lastDate)}`),
  ];
  const n = sample.skipped.length;
  if (n > 0) {
    const listed = sample.skipped.slice(0, LISTED).map((s) => `${lineWithDate(s.line, s.date)}: ${s.reason}`).join('; ');
    const more = n > LISTED ? `; and ${n - LISTED} more (--json lists them all)` : '';
    out.push(labelled('Skipped', `${n} row${n === 1 ? '' : 's'} as gaps: ${listed}${more}`));
  }
  return out.join('\n');
}

/** The sample as a JSON object. */
export function sampleJson(sample: SampleInfo): Record<string, unknown> {
  return { ...sample, skipped: sample.skipped.map((s) => ({ ...s })) };
}
