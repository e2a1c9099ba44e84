import { describe, expect, it } from 'vitest';
import type { Command } from '../../addin/cli/command';
import { MooringInputError } from '../../addin/errors';
import { seriesFromContext } from '../../addin/cli/series-input';
import { choiceValue } from '../../addin/cli/option-values';
import { expectOneLineRefusal, pricesCsv, runWith } from './cli-harness';

/** A stand-in command: reports the mean of the series, so the runner is tested apart from the engine. */
const meanCommand: Command = {
  name: 'mean',
  summary: 'mean of one series',
  description: ['Averages the series.'],
  usage: 'mooring mean <file.csv> --series NAME',
  options: [{ name: 'style', value: 'plain|fancy', help: 'how to print' }],
  run(context) {
    const style = choiceValue('style', context.args.values.get('style'), ['plain', 'fancy'] as const) ?? 'plain';
    const input = seriesFromContext(context);
    const v = input.series.values;
    let m = 0;
    for (const x of v) m += x;
    m /= v.length;
    return { terminal: `${style} mean of ${input.label}: ${m}`, json: { series: input.label, mean: m, values: v, broken: NaN } };
  },
};

const crashCommand: Command = {
  name: 'crash',
  summary: 'always fails inside',
  description: [],
  usage: 'mooring crash <file.csv>',
  options: [],
  run() {
    throw new TypeError('cannot read properties of undefined\n    at somewhere (x.ts:1:1)');
  },
};

const table = [meanCommand, crashCommand];
const files = { 'p.csv': pricesCsv(40), 'one.csv': 'x\n' + Array.from({ length: 25 }, (_, i) => String(i + Math.sin(i))).join('\n') };

describe('runner: output', () => {
  it('prints the report followed by the cautions, exit 0', () => {
    const run = runWith(table, ['mean', 'p.csv', '--series', 'Walk'], files);
    expect(run.code).toBe(0);
    expect(run.stderr).toBe('');
    expect(run.stdout).toMatch(/^plain mean of Walk: \d/);
    expect(run.stdout).toContain('not advice to trade');
    expect(run.stdout).toContain('can break without warning');
    expect(run.stdout).toContain('false discoveries');
    expect(run.stdout).toContain('licensed financial advice come first');
  });

  it('--json prints exactly one parseable object, with typed arrays as arrays and NaN as null', () => {
    const run = runWith(table, ['mean', 'p.csv', '--series=Walk', '--json', '--log'], files);
    expect(run.code).toBe(0);
    const object = JSON.parse(run.stdout);
    expect(typeof object).toBe('object');
    expect(run.stdout.trim().startsWith('{')).toBe(true);
    expect(run.stdout.trim().endsWith('}')).toBe(true);
    expect(object.command).toBe('mean');
    expect(object.file).toBe('p.csv');
    expect(object.series).toBe('ln(Walk)');
    expect(object.values).toHaveLength(40);
    expect(object.broken).toBeNull();
    expect(object.cautions).toHaveLength(4);
  });

  it('option words and command names are case-insensitive', () => {
    const run = runWith(table, ['MEAN', 'p.csv', '--Series', 'Walk', '--style', 'FANCY'], files);
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/^fancy mean/);
  });

  it('--series may be left out when the file holds one series', () => {
    expect(runWith(table, ['mean', 'one.csv'], files).code).toBe(0);
  });

  it('-- ends the options', () => {
    const run = runWith(table, ['mean', '--series', 'Walk', '--', 'p.csv'], files);
    expect(run.code).toBe(0);
  });
});

describe('runner: help', () => {
  it('--help lists the commands and the common options', () => {
    for (const argv of [['--help'], ['help'], ['-h']]) {
      const run = runWith(table, argv);
      expect(run.code).toBe(0);
      expect(run.stdout).toMatch(/mean +mean of one series/);
      expect(run.stdout).toContain('--skip-gaps');
    }
  });

  it('per-command help, with or without a file', () => {
    for (const argv of [['mean', '--help'], ['help', 'mean'], ['mean', 'p.csv', '--style', 'odd', '-h']]) {
      const run = runWith(table, argv);
      expect(run.code).toBe(0);
      expect(run.stdout).toContain('Usage:  mooring mean <file.csv> --series NAME');
      expect(run.stdout).toContain('--style plain|fancy');
    }
  });
});

describe('runner: bad input is one line on stderr, exit 2, no stack', () => {
  const cases: [string, string[], RegExp][] = [
    ['no command', [], /^mooring: No command given; the commands are mean, crash/],
    ['unknown command', ['maen', 'p.csv'], /^mooring: Unknown command 'maen' \(did you mean mean\?\)/],
    ['unknown option', ['mean', 'p.csv', '--seris', 'Walk'], /^mooring: Unknown option --seris for mean \(did you mean --series\?\); its options are --series, --log, --skip-gaps, --json, --from, --to, --dates, --date-order, --fill-forward, --delimiter, --decimal, --style\.$/],
    ['wrong option word', ['mean', 'p.csv', '--series', 'Walk', '--style', 'loud'], /^mooring: --style must be one of plain, fancy, not 'loud'\.$/],
    ['missing value', ['mean', 'p.csv', '--series'], /^mooring: --series needs a value: --series NAME\.$/],
    ['switch with a value', ['mean', 'p.csv', '--log=yes'], /^mooring: --log is a switch and takes no value/],
    ['repeated option', ['mean', 'p.csv', '--json', '--json'], /^mooring: --json is given more than once/],
    ['missing file argument', ['mean', '--series', 'Walk'], /^mooring: mean needs a CSV file: mooring mean <file\.csv> --series NAME\.$/],
    ['two files, both read (to be joined on their dates)', ['mean', 'p.csv', 'b.csv'], /^mooring: Cannot read 'b\.csv': no such file/],
    ['file not found', ['mean', 'nowhere.csv', '--series', 'Walk'], /^mooring: Cannot read 'nowhere\.csv': no such file; check the name and the folder\.$/],
    ['unknown series', ['mean', 'p.csv', '--series', 'Crude'], /^mooring: No column is named 'Crude'; the series are: Walk, Calm, Drift\.$/],
    ['no series chosen', ['mean', 'p.csv'], /^mooring: mean needs --series NAME to choose a column; the series are: Walk, Calm, Drift\.$/],
    ['help for an unknown command', ['help', 'nope'], /^mooring: Unknown command 'nope'/],
  ];
  for (const [what, argv, pattern] of cases) {
    it(what, () => {
      expect(expectOneLineRefusal(runWith(table, argv, files))).toMatch(pattern);
    });
  }

  it('a ragged CSV row names the file and the line', () => {
    const csv = pricesCsv(30).split('\n');
    csv[12] = csv[12].split(',').slice(0, 3).join(',');
    const line = expectOneLineRefusal(runWith(table, ['mean', 'r.csv', '--series', 'Walk'], { 'r.csv': csv.join('\n') }));
    expect(line).toBe('mooring: r.csv: Line 13 has 3 fields but the header has 4: look for a missing or extra comma (text that contains commas must be in double quotes).');
  });

  it('a text cell names the line and the date', () => {
    const csv = pricesCsv(30, 3, (row, i) => { if (i === 9) row[1] = 'n/a'; });
    const line = expectOneLineRefusal(runWith(table, ['mean', 'g.csv', '--series', 'Walk'], { 'g.csv': csv }));
    expect(line).toBe("mooring: Walk line 11 (2020-01-10) is text 'n/a': clean it or give --skip-gaps.");
    const skipped = runWith(table, ['mean', 'g.csv', '--series', 'Walk', '--skip-gaps', '--json'], { 'g.csv': csv });
    expect(skipped.code).toBe(0);
    expect(JSON.parse(skipped.stdout).values).toHaveLength(29);
  });

  it('a multi-line message is folded onto one line', () => {
    const multi: Command = { ...crashCommand, name: 'multi', run() { throw new MooringInputError('first part\nsecond part'); } };
    const line = expectOneLineRefusal(runWith([multi], ['multi', 'p.csv'], files));
    expect(line).toBe('mooring: first part second part');
  });
});

describe('runner: internal errors', () => {
  it('are one line on stderr with exit 1 and no stack', () => {
    const run = runWith(table, ['crash', 'p.csv'], files);
    expect(run.code).toBe(1);
    expect(run.stdout).toBe('');
    expect(run.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/^mooring: internal error \(TypeError: cannot read properties of undefined at somewhere \(x\.ts:1:1\)\); please report it/);
  });
});
