import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { REPORT_CSP } from '../../addin/cli/render/diagnostic-html';
import { escapeHtml } from '../../addin/cli/render/html-text';
import { SeededRandom } from '../../addin/random';
import { htmlProblems } from './html-check';
import { ARTIFACTS, DEMO_CSV, runMooring } from './report-run';
import { ar1, walk } from './seeded-series';

beforeAll(() => {
  mkdirSync(ARTIFACTS, { recursive: true });
});

describe('the HTML report of the demo (--out)', () => {
  const out = join(ARTIFACTS, 'demo-report.html');
  let html = '';
  let stdout = '';
  beforeAll(() => {
    const run = runMooring(['report', DEMO_CSV, '--log', '--out', out]);
    expect(run.code, run.stderr).toBe(0);
    stdout = run.stdout;
    html = readFileSync(out, 'utf8');
  });

  it('is well formed: every tag closes in order and no stray < or > is left in the text', () => {
    expect(htmlProblems(html)).toEqual([]);
  });

  it('carries the strict content security policy and loads nothing: no script, no external link or source', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain(`<meta http-equiv="Content-Security-Policy" content="${escapeHtml(REPORT_CSP)}">`);
    expect(REPORT_CSP).toContain("default-src 'none'");
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/\b(src|href)="(?!#)/i);
    expect(html.replace(/xmlns="http:\/\/www\.w3\.org\/2000\/svg"/g, '')).not.toMatch(/https?:\/\//);
  });

  it('draws the series chart and, for each of the two related pairs, the spread, its rolling z-score, the hedge ratio through time and the forecast fan', () => {
    expect(html.match(/<svg /g)?.length).toBe(1 + 2 * 4);
    expect(html).toContain('+2 sd');
    expect(html).toContain('z-score, trailing 60 days');
  });

  it('says plainly that a test is evidence, not advice; that relations break; that screening yields false discoveries; that the user\'s policy comes first', () => {
    expect(html).toContain('not advice to trade');
    expect(html).toMatch(/relations between prices break/i);
    expect(html).toContain('false discoveries');
    expect(html).toContain('Your own risk policy and licensed financial advice come first');
  });

  it('and the terminal output says where the file went', () => {
    expect(stdout).toContain(out);
  });
});

describe('the HTML report with DF-GLS deciding the orders (--unit-root dfgls)', () => {
  it('says which test decided, shows its column, and stays well formed', () => {
    const out = join(ARTIFACTS, 'demo-report-dfgls.html');
    const run = runMooring(['report', DEMO_CSV, '--series', 'GateGasoil,DockDiesel', '--log', '--unit-root', 'dfgls', '--out', out, '--force']);
    expect(run.code, run.stderr).toBe(0);
    const page = readFileSync(out, 'utf8');
    expect(htmlProblems(page)).toEqual([]);
    expect(page).toContain('<li>Orders of integration decided by DF-GLS on the levels, ADF on the changes.</li>');
    expect(page).toContain('DF-GLS p, levels');
    expect(page).toContain('Ng-Perron MZt p, levels (comparison)');
    expect(page).toContain('it is shown for comparison and does not decide the order');
    expect(page).toContain('DF-GLS and KPSS');
  });

  it('and by ADF when nothing else is asked', () => {
    const out = join(ARTIFACTS, 'demo-report-adf.html');
    const run = runMooring(['report', DEMO_CSV, '--series', 'GateGasoil,DockDiesel', '--log', '--out', out, '--force']);
    expect(run.code, run.stderr).toBe(0);
    const page = readFileSync(out, 'utf8');
    expect(page).toContain('<li>Orders of integration decided by ADF.</li>');
    expect(page).not.toContain('DF-GLS p, levels');
    expect(page).not.toContain('Ng-Perron MZt');
  });
});

describe('a hostile column header', () => {
  const hostile = '<script>alert("x")</script>';
  const other = 'B&"\'<b>';
  let html = '';
  beforeAll(() => {
    const rng = new SeededRandom(5);
    const x = walk(rng, 120, 0.01, 1);
    const noise = ar1(rng, 120, 0.5, 0.01);
    const lines = [`Date,"${hostile.replace(/"/g, '""')}","${other.replace(/"/g, '""')}"`];
    for (let t = 0; t < 120; t++) {
      const day = new Date(Date.UTC(2023, 0, 2 + t)).toISOString().slice(0, 10);
      lines.push(`${day},${Math.exp(x[t]).toFixed(5)},${Math.exp(0.1 + x[t] + noise[t]).toFixed(5)}`);
    }
    const out = join(ARTIFACTS, 'hostile.html');
    const run = runMooring(['report', 'hostile.csv', '--log', '--out', out], { 'hostile.csv': `${lines.join('\n')}\n` });
    expect(run.code, run.stderr).toBe(0);
    html = readFileSync(out, 'utf8');
  });

  it('is escaped wherever it appears, so the page holds no script and stays well formed', () => {
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toContain('<b>');
    expect(html).toContain(escapeHtml(hostile));
    expect(html).toContain(escapeHtml(other));
    expect(htmlProblems(html)).toEqual([]);
  });
});

describe('the well-formedness check itself', () => {
  it('catches a tag closed out of order, an unclosed tag and raw text with <', () => {
    expect(htmlProblems('<p><b>x</p></b>')).not.toEqual([]);
    expect(htmlProblems('<section><p>x</p>')).toEqual(['unclosed: section']);
    expect(htmlProblems('<p>1 < 2</p>')).not.toEqual([]);
    expect(htmlProblems('<p>fine &lt; 2<br></p><svg><path d="M0 0"/></svg>')).toEqual([]);
  });
});
