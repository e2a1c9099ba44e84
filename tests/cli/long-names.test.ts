/**
 * A header of 100,000 characters (found in the hostile-input pass of issue 13): on the terminal
 * every name from the data is shortened by one helper (addin/cli/render/shown-name.ts), in
 * reports, tables and messages alike, while --json keeps the full name. The prices are the demo
 * data (Mooring's own seeded generator) with one header replaced.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { SHOWN_NAME_LIMIT, shownName, shownNames } from '../../addin/cli/render/shown-name';
import { expectOneLineRefusal, runWith } from './cli-harness';

const demo = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8').trim().split('\n');
const long = 'G'.repeat(100_000);
const spaced = Array.from({ length: 5_000 }, (_, i) => `word${i}`).join(' ');
const withHeader = (name: string) => `${[demo[0].replace('GateGasoil', name), ...demo.slice(1)].join('\n')}\n`;
const files = { 'g.csv': withHeader(long), 's.csv': withHeader(spaced) };
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, files);

describe('shownName', () => {
  it('keeps a name up to the limit whole and shortens a longer one to its start, its end and its length', () => {
    expect(shownName('GateGasoil')).toBe('GateGasoil');
    const edge = 'a'.repeat(SHOWN_NAME_LIMIT);
    expect(shownName(edge)).toBe(edge);
    const s = shownName(`${'a'.repeat(50)}${'z'.repeat(50)}`);
    expect(s).toMatch(/^a+\.\.\.z+ \(100 characters\)$/);
    expect(s.length).toBeLessThan(SHOWN_NAME_LIMIT);
  });

  it('never splits a character outside the basic plane', () => {
    const s = shownName('\u{1F600}'.repeat(100));
    expect(s).toBe(`${'\u{1F600}'.repeat(24)}...${'\u{1F600}'.repeat(8)} (100 characters)`);
  });

  it('two long names with the same start and end get distinct shortened forms', () => {
    const a = `${'x'.repeat(40)}A${'y'.repeat(40)}`;
    const b = `${'x'.repeat(40)}B${'y'.repeat(40)}`;
    const map = shownNames([a, b, 'short']);
    expect(map.size).toBe(2);
    expect(map.get(a)).not.toBe(map.get(b));
  });
});

describe('the terminal shows long names shortened; JSON keeps them whole', () => {
  const noLongRun = (text: string) => expect(text).not.toMatch(/G{61}/);

  it.each([
    ['eg', '--y', long, '--x', 'DockDiesel'],
    ['rolling', '--y', long, '--x', 'DockDiesel', '--window', '100', '--step', '50'],
    ['report', '--series', `${long},DockDiesel`],
    ['johansen', '--series', `${long},DockDiesel`],
    ['screen', '--threads', '1'],
    ['adf', '--series', long],
  ])('%s: the report is short and names the series by its shortened form', (command, ...options) => {
    const out = run(command, 'g.csv', ...options);
    expect(out.stderr).toBe('');
    expect(out.code).toBe(0);
    noLongRun(out.stdout);
    expect(out.stdout).toContain(`${'G'.repeat(24)}...${'G'.repeat(8)}`); // the count may wrap onto the next line
    expect(out.stdout.length).toBeLessThan(20_000);
  });

  it('a table lays its columns out for the shortened name (no line padded to the full name)', () => {
    const out = run('screen', 'g.csv', '--threads', '1');
    const widest = Math.max(...out.stdout.split('\n').map((l) => l.length));
    expect(widest).toBeLessThan(200);
  });

  it('a long name made of words is shortened before the report wraps it', () => {
    const out = run('eg', 's.csv', '--y', spaced, '--x', 'DockDiesel');
    expect(out.code).toBe(0);
    expect(out.stdout).toContain('(43889 characters)');
    expect(out.stdout).not.toContain('word100 word101');
  });

  it('messages shorten both the name asked for and the names offered', () => {
    const missing = expectOneLineRefusal(run('adf', 'g.csv', '--series', `X${long}`));
    noLongRun(missing);
    expect(missing).toContain('(100001 characters)');
    expect(missing).toContain(shownName(long));
    expect(missing.length).toBeLessThan(400);
    noLongRun(expectOneLineRefusal(run('adf', 'g.csv', '--series', 'Nope')));
  });

  it('--json keeps the full name', () => {
    const out = run('eg', 'g.csv', '--y', long, '--x', 'DockDiesel', '--json');
    expect(out.code).toBe(0);
    const object = JSON.parse(out.stdout);
    expect(JSON.stringify(object)).toContain(`"${long}"`);
    expect(out.stdout).not.toContain(shownName(long));
    const screened = JSON.parse(run('screen', 'g.csv', '--threads', '1', '--json').stdout);
    expect(screened.series).toContain(long);
  });
});
