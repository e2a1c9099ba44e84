import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { REPORT_MARKER } from '../../addin/cli/render/diagnostic-html';
import { existingFile } from '../../addin/cli/report-file';
import { expectOneLineRefusal, pricesCsv, runWith } from './cli-harness';

/**
 * `report --out` must not destroy a file Mooring did not write (issue 13, item 11): such a file
 * is refused unless --force; a report Mooring wrote (its head carries REPORT_MARKER) is replaced.
 * Real files in a fresh temporary folder; the prices are the harness's seeded series.
 */
const folder = mkdtempSync(join(tmpdir(), 'mooring-out-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));
const files = { 'prices.csv': pricesCsv(160, 21) };
const report = (...extra: string[]) => runWith(MOORING_COMMANDS, ['report', 'prices.csv', '--series', 'Walk,Drift', ...extra], files);

describe('report --out and a file already there', () => {
  it('refuses to overwrite a file Mooring did not write, and leaves it as it was', () => {
    const path = join(folder, 'notes.html');
    const mine = '<!DOCTYPE html><html><head><title>My notes</title></head><body><p>Do not lose me.</p></body></html>\n';
    writeFileSync(path, mine);
    const line = expectOneLineRefusal(report('--out', path));
    expect(line).toContain(`'${path}' already exists and is not a report Mooring wrote`);
    expect(line).toContain('--force');
    expect(readFileSync(path, 'utf8')).toBe(mine);
  });

  it('replaces that file with --force, and the new page carries the marker in its head', () => {
    const path = join(folder, 'forced.html');
    writeFileSync(path, 'not a report\n');
    const run = report('--out', path, '--force');
    expect(run.code, run.stderr).toBe(0);
    const html = readFileSync(path, 'utf8');
    expect(html.indexOf(REPORT_MARKER)).toBeGreaterThan(0);
    expect(html.indexOf(REPORT_MARKER)).toBeLessThan(html.indexOf('</head>'));
  });

  it('replaces a report Mooring wrote before without asking', () => {
    const path = join(folder, 'again.html');
    expect(report('--out', path).code).toBe(0);
    expect(existingFile(path)).toBe('mooring-report');
    const second = runWith(MOORING_COMMANDS, ['report', 'prices.csv', '--series', 'Walk,Calm', '--out', path], files);
    expect(second.code, second.stderr).toBe(0);
    expect(readFileSync(path, 'utf8')).toContain('Walk and Calm');
  });

  it('recognises a report written before the marker existed by its closing line', () => {
    const path = join(folder, 'older.html');
    writeFileSync(path, '<html><body><main>...</main><footer><p>Mooring pairwise diagnostic, report version 3. Statistical evidence about past prices, not advice to trade.</p></footer></body></html>\n');
    expect(existingFile(path)).toBe('mooring-report');
    expect(report('--out', path).code).toBe(0);
    expect(readFileSync(path, 'utf8')).toContain(REPORT_MARKER);
  });

  it('refuses a folder or an empty file the same way, and says what lies at a path', () => {
    expect(existingFile(join(folder, 'nothing-here.html'))).toBe('none');
    const empty = join(folder, 'empty.html');
    writeFileSync(empty, '');
    expect(existingFile(empty)).toBe('other');
    expectOneLineRefusal(report('--out', empty));
    expect(readFileSync(empty, 'utf8')).toBe('');
  });

  it('treats a folder or a named pipe as a file it did not write, without waiting on the pipe', () => {
    expect(existingFile(folder)).toBe('other');
    const pipe = join(folder, 'pipe.html');
    if (process.platform !== 'win32' && spawnSync('mkfifo', [pipe]).status === 0) {
      expect(existingFile(pipe)).toBe('other');
      expectOneLineRefusal(report('--out', pipe));
    }
  });

  it('takes --force only with --out, and the help names it', () => {
    expect(expectOneLineRefusal(report('--force'))).toContain('--force allows --out to replace an existing file');
    const help = runWith(MOORING_COMMANDS, ['report', '--help']);
    expect(help.stdout.replace(/\s+/g, ' ')).toContain('--force with --out: replace the file even if Mooring did not write it');
  });
});
