import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { callFunction } from '../../taskpane/workbook/formula-functions';
import { arrayOf } from '../../taskpane/workbook/formula-values';

/**
 * Spreading an array into a call (Math.min(...values), list.push(...values)) passes every
 * element as an argument, and a few hundred thousand of them overflow the call stack: that is
 * how `rolling --window 250` on a million rows died. The engine and the formulas must not do it
 * with anything data-sized.
 */
function sourceFiles(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const path = join(folder, name);
    return statSync(path).isDirectory() ? sourceFiles(path) : path.endsWith('.ts') ? [path] : [];
  });
}

/** Calls that spread an array into arguments: Math.min/Math.max(...x) and push(...x). */
const SPREAD_CALL = /Math\.(min|max)\(\s*\.\.\.|\.push\(\s*\.\.\./;

/**
 * The spreads left on purpose, each over a handful of items whatever the data: warnings of one
 * Johansen run, the replication counts of a table's provenance, two p-values, the commands and
 * options of the help, the lines of one chart, a benchmark's fixed sample, the two ends of an
 * interval.
 */
const SMALL_ON_PURPOSE: Record<string, RegExp> = {
  'addin/johansen/johansen.ts': /warnings\.push\(\.\.\.relations\.warnings\)/,
  'addin/johansen/johansen-warnings.ts': /Math\.(min|max)\(\.\.\.counts\)/,
  'addin/report/pair-cointegration.ts': /Math\.max\(\.\.\.ps\)/,
  'addin/cli/help.ts': /Math\.max\(\.\.\.(left|commands)\.map/,
  'addin/cli/render/svg-chart.ts': /Math\.max\(\.\.\.spec\.lines\.map/,
  'addin/bench/screen-bench.ts': /Math\.max\(\.\.\.sample\.map/,
  'addin/spread/half-life-interval.ts': /Math\.(min|max)\(\.\.\.lives\)/,
};

describe('no data-sized array is spread into a call', () => {
  it('in addin/ and functions/, apart from the listed small ones', () => {
    const found: string[] = [];
    for (const file of [...sourceFiles('addin'), ...sourceFiles('functions')]) {
      readFileSync(file, 'utf8').split('\n').forEach((line, i) => {
        if (!SPREAD_CALL.test(line) || /^\s*(\*|\/\/)/.test(line)) return;
        const allowed = SMALL_ON_PURPOSE[file.replace(/\\/g, '/')];
        if (allowed && allowed.test(line)) return;
        found.push(`${file}:${i + 1}: ${line.trim()}`);
      });
    }
    expect(found).toEqual([]);
  });

  it('the in-memory workbook sums and counts a column of 500,000 cells', () => {
    const column = arrayOf(Array.from({ length: 500_000 }, (_, i) => [i % 7]));
    const read = () => [[0]];
    expect(callFunction('COUNT', { args: [column], read })).toBe(500_000);
    // 71,428 whole cycles of 0..6 (21 each) and 0 + 1 + 2 + 3: 1,499,994 over 500,000
    expect(callFunction('AVERAGE', { args: [column], read })).toBeCloseTo(1_499_994 / 500_000, 12);
  });
});
