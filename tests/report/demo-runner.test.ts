import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { htmlProblems } from './html-check';

// The demo runner against the built command line (npm test builds dist/ before vitest), as
// `npm run demo` runs it after its own build.
describe('node addin/demo/run-demo.mjs', () => {
  it('prints the readable diagnostic and the path of a well-formed HTML report under demo-output/, outside the dist/ a build empties', () => {
    expect(existsSync('dist/cli/mooring.js'), 'dist/cli/mooring.js: run npm run build:cli first (npm test does)').toBe(true);
    const run = spawnSync(process.execPath, ['addin/demo/run-demo.mjs'], { encoding: 'utf8' });
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toContain('Findings at the 5% level');
    expect(run.stdout).toContain('DockDiesel and GateGasoil share a long-run relation');
    const path = /The HTML report .* is at\n {2}(\S+)\n/.exec(run.stdout)?.[1];
    expect(path).toMatch(/demo-output\/mooring-demo-report\.html$/);
    expect(path).not.toMatch(/dist\//);
    expect(htmlProblems(readFileSync(path!, 'utf8'))).toEqual([]);
  });
});
