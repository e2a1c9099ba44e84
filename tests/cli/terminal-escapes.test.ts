import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { jsonText, terminalText } from '../../addin/cli/render/terminal-text';
import { expectOneLineRefusal, pricesCsv, runWith } from './cli-harness';

/**
 * Control characters in a file's headers and cells never reach the terminal raw (issue 13,
 * item 10): a colour sequence, a window-title sequence (OSC ... BEL), a one-byte C1 CSI and a
 * direction override, in the headers of the harness's seeded prices, through adf (also its
 * unknown-series message), screen, report, a refusal naming a cell, and --json.
 */
const RED = 'Red\u001b[31mAlert\u001b[0m';
const TITLE = 'Title\u001b]0;owned\u0007X';
const C1 = 'C1\u009b2JY\u202eLTR';
/** Any character terminalText would have escaped (line feed aside). */
const RAW_CONTROL = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u200b-\u200f\u2028-\u202e\u2060-\u2069\ufeff]/;

const quoted = (s: string) => `"${s.replace(/"/g, '""')}"`;
function hostileCsv(edit?: (row: string[], i: number) => void): string {
  const [, ...body] = pricesCsv(140, 8, edit).split('\n');
  return [['Date', RED, TITLE, C1].map(quoted).join(','), ...body].join('\n');
}
const files = { 'hostile.csv': hostileCsv() };
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, files);

describe('terminalText', () => {
  it('shows C0, DEL and C1 controls and direction overrides as visible escapes, and keeps line feeds unless on one line', () => {
    expect(terminalText(RED)).toBe('Red\\x1b[31mAlert\\x1b[0m');
    expect(terminalText(TITLE)).toBe('Title\\x1b]0;owned\\x07X');
    expect(terminalText(C1)).toBe('C1\\x9b2JY\\u202eLTR');
    expect(terminalText('a\rb\tc\u007fd')).toBe('a\\x0db\\x09c\\x7fd');
    expect(terminalText('line one\nline two')).toBe('line one\nline two');
    expect(terminalText('line one\nline two', true)).toBe('line one\\x0aline two');
  });

  it('leaves ordinary text alone, accents and other scripts included', () => {
    const plain = 'Brent – WTI, Δ price 5% (Zürich, 東京) \\ backslash';
    expect(terminalText(plain)).toBe(plain);
  });

  it('jsonText escapes what JSON.stringify leaves raw, and the result parses back to the same strings', () => {
    const value = { names: [RED, TITLE, C1, 'x\u2028y\u0085z'] };
    const raw = JSON.stringify(value);
    expect(raw).toMatch(/[\u0085\u009b\u202e\u2028]/); // JSON.stringify leaves these raw
    const safe = jsonText(raw);
    expect(safe).not.toMatch(RAW_CONTROL);
    expect(JSON.parse(safe)).toEqual(value);
  });
});

describe('control characters from the data never reach the terminal raw', () => {
  it('adf: the unknown-series message lists the names with visible escapes, on one line', () => {
    const line = expectOneLineRefusal(run('adf', 'hostile.csv', '--series', 'Nope'));
    expect(line).not.toMatch(RAW_CONTROL);
    expect(line).toContain('Red\\x1b[31mAlert\\x1b[0m');
    expect(line).toContain('Title\\x1b]0;owned\\x07X');
    expect(line).toContain('C1\\x9b2JY\\u202eLTR');
  });

  it('adf on a hostile column: the report names it with visible escapes', () => {
    const r = run('adf', 'hostile.csv', '--series', RED);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).not.toMatch(RAW_CONTROL);
    expect(r.stdout).toContain('on Red\\x1b[31mAlert\\x1b[0m');
  });

  it('screen: names in the header lines and the table are escaped', () => {
    const r = run('screen', 'hostile.csv');
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).not.toMatch(RAW_CONTROL);
    expect(r.stdout).toContain('Title\\x1b]0;owned\\x07X');
  });

  it('report: findings, tables and warnings are escaped', () => {
    const r = run('report', 'hostile.csv', '--series', `${RED},${TITLE}`);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).not.toMatch(RAW_CONTROL);
    expect(r.stdout).toContain('Red\\x1b[31mAlert\\x1b[0m');
  });

  it('report: a table with an escaped name stays aligned (widths counted as shown)', () => {
    // RED shows 6 characters wider than its length, C1 8: counted by length, the columns would part.
    const r = run('report', 'hostile.csv', '--series', `${RED},${C1}`);
    const rows = r.stdout.split('\n').filter((l) => /^  (Red|C1)\S* +I\(\d\)/.test(l));
    expect(rows).toHaveLength(2);
    expect(rows[0].indexOf(' I(')).toBeGreaterThan(0);
    expect(rows[0].search(/ {2}I\(/)).toBe(rows[1].search(/ {2}I\(/));
  });

  it('a refusal quoting a cell that holds an escape sequence is one line with the sequence visible', () => {
    const csv = hostileCsv((row, i) => {
      if (i === 30) row[1] = 'n/a\u001b[2J\u001b]0;gone\u0007';
    });
    const line = expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'h.csv', '--series', RED], { 'h.csv': csv }));
    expect(line).not.toMatch(RAW_CONTROL);
    expect(line).toContain('\\x1b[2J');
  });

  it('--json stays valid JSON with the true names, and holds no raw control character', () => {
    const r = run('screen', 'hostile.csv', '--json');
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).not.toMatch(RAW_CONTROL);
    const parsed = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(JSON.stringify(parsed)).toContain(JSON.stringify(C1).slice(1, -1));
    const adf = JSON.parse(run('adf', 'hostile.csv', '--series', C1, '--json').stdout) as Record<string, unknown>;
    expect(JSON.stringify(adf)).toContain(JSON.stringify(C1).slice(1, -1));
  });
});
