import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../../addin/random';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { DIAGNOSTIC_REPORT_VERSION } from '../../addin/report/report-types';
import { CAUTIONS } from '../../addin/cli/render/cautions';
import { DEMO_CSV, runMooring } from './report-run';
import { ar1, leaderFollower, walk } from './seeded-series';

/** Field names listed in backticks in the first column of a README table under the heading. */
function documentedFields(heading: string): string[] {
  const text = readFileSync('addin/report/README.md', 'utf8');
  const section = text.split(/^## /m).find((s) => s.startsWith(heading));
  if (!section) throw new Error(`no section '${heading}' in addin/report/README.md`);
  return section
    .split('\n')
    .filter((l) => l.startsWith('| `'))
    .flatMap((l) => [...l.split('|')[1].matchAll(/`([a-zA-Z]+)`/g)].map((m) => m[1]));
}

/** Every typed array or non-finite number anywhere in the object, by path. */
function notJsonSafe(value: unknown, path = 'report'): string[] {
  if (ArrayBuffer.isView(value)) return [path];
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (value === undefined || typeof value === 'function') return [path];
  if (Array.isArray(value)) return value.flatMap((v, i) => notJsonSafe(v, `${path}[${i}]`));
  if (value !== null && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => notJsonSafe(v, `${path}.${k}`));
  return [];
}

const rng = new SeededRandom(41);
const lf = leaderFollower(41, 300, { gamma: 0.2 });
const report = diagnose({
  series: [{ name: 'Lead', values: lf.leader }, { name: 'Follow', values: lf.follower }, { name: 'Calm', values: ar1(rng, 300, 0.4, 0.02, 2) }, { name: 'Free', values: walk(rng, 300) }],
});

describe('the report object', () => {
  it('has exactly the top-level fields addin/report/README.md documents', () => {
    expect(Object.keys(report).sort()).toEqual(documentedFields('Top level').sort());
    expect(report.kind).toBe('mooring-pairwise-diagnostic');
    expect(report.version).toBe(DIAGNOSTIC_REPORT_VERSION);
  });

  it('gives every pair exactly the fields the README documents', () => {
    const fields = documentedFields('A pair').sort();
    for (const p of report.pairs) expect(Object.keys(p).sort()).toEqual(fields);
  });

  it('holds no typed array, NaN, infinity or undefined anywhere, so it survives JSON unchanged', () => {
    expect(notJsonSafe(report)).toEqual([]);
    expect(JSON.parse(JSON.stringify(report))).toEqual(report);
  });

  it('gives every series a chart line as long as the data', () => {
    for (const s of report.series) expect(s.chart.values).toHaveLength(report.data.observations);
  });
});

describe('mooring report --json', () => {
  it('prints one object: the report under "report", the HTML file (null without --out), the columns left out and the cautions', () => {
    const run = runMooring(['report', DEMO_CSV, '--series', 'GateGasoil,DockDiesel', '--log', '--json']);
    expect(run.code, run.stderr).toBe(0);
    const object = JSON.parse(run.stdout) as Record<string, unknown>;
    expect(Object.keys(object).sort()).toEqual(['cautions', 'command', 'file', 'halfLifeUnit', 'htmlFile', 'leftOut', 'report', 'spacing', 'warnings']);
    expect(object.command).toBe('report');
    expect(object.htmlFile).toBeNull();
    expect(object.cautions).toEqual([...CAUTIONS]);
    const inner = object.report as typeof report;
    expect(inner.series.map((s) => s.name)).toEqual(['GateGasoil', 'DockDiesel']);
    expect(inner.system).toBeNull();
    expect(inner.pairs).toHaveLength(1);
  });

  it('takes every column of numbers without --series, and names the columns it left out', () => {
    const csv = 'Date,A,Region,B\n' + Array.from({ length: 40 }, (_, i) => `${new Date(Date.UTC(2024, 0, 1 + i)).toISOString().slice(0, 10)},${100 + i + Math.sin(i)},north,${50 + i * 0.5 + Math.cos(i * 1.7)}`).join('\n');
    const run = runMooring(['report', 'mixed.csv', '--json'], { 'mixed.csv': csv });
    expect(run.code, run.stderr).toBe(0);
    const object = JSON.parse(run.stdout) as { report: typeof report; leftOut: string[] };
    expect(object.report.series.map((s) => s.name)).toEqual(['A', 'B']);
    expect(object.leftOut).toEqual(['Region']);
  });
});
