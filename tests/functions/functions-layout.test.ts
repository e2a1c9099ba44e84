/**
 * The shape of the function layer (functions/), as the style guide asks: the files of custom
 * functions the build scans (functions.ts and the files it re-exports) are thin (each function
 * one call inside answer()), refusals are mapped to cell errors in one
 * place, every file stays small, and nothing under addin/ depends on the function layer.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const FUNCTIONS = join(ROOT, 'functions');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? filesUnder(path) : path.endsWith('.ts') ? [path] : [];
  });
}

/** The files the build scans for custom functions (webpack.config.js), functions.ts first. */
const require = createRequire(import.meta.url);
const { FUNCTION_SOURCES } = require('../../webpack.config.js') as { FUNCTION_SOURCES: string[] };

describe('functions/', () => {
  const source = FUNCTION_SOURCES.map((f) => readFileSync(f, 'utf8')).join('\n');

  it('the scanned files are functions.ts and the files it re-exports, all under functions/', () => {
    expect(FUNCTION_SOURCES[0]).toBe(join(FUNCTIONS, 'functions.ts'));
    const main = readFileSync(FUNCTION_SOURCES[0], 'utf8');
    for (const f of FUNCTION_SOURCES.slice(1)) {
      expect(relative(FUNCTIONS, f)).not.toMatch(/^\.\./);
      expect(main).toContain(`export * from './${relative(FUNCTIONS, f).replace(/\.ts$/, '')}';`);
    }
  });

  it('the scanned files are thin: every custom function is one call inside answer()', () => {
    const bodies = [...source.matchAll(/export function (\w+)\([^)]*\)[^{]*\{\n([\s\S]*?)\n\}/g)];
    // Every exported function of the scanned files is a custom function: as many bodies as tags.
    expect(bodies.length).toBe([...source.matchAll(/@customfunction /g)].length);
    expect(bodies.length).toBeGreaterThanOrEqual(21);
    for (const [, name, body] of bodies) {
      if (name === 'version') continue;
      expect(body.trim(), name).toMatch(/^return answer\(\(\) => \w+Cell\([\w, ]*\)\);$/);
    }
  });

  it('every custom function has its JSDoc tag and help link right above it', () => {
    const tags = [...source.matchAll(/@customfunction (\w+)\n \* @helpurl https:\/\/localhost:3000\/docs\/functions\.md#(\w+)/g)];
    expect(tags.length).toBe([...source.matchAll(/@customfunction /g)].length);
    expect(tags.length).toBeGreaterThanOrEqual(21);
    for (const [, id, anchor] of tags) expect(anchor).toBe(id.toLowerCase());
  });

  it('only cells/answer.ts turns errors into cell errors', () => {
    const callers = filesUnder(FUNCTIONS).filter((f) => /\bcellError\(/.test(readFileSync(f, 'utf8')) && !f.endsWith('cell-error.ts'));
    expect(callers.map((f) => relative(FUNCTIONS, f))).toEqual([join('cells', 'answer.ts')]);
  });

  it('every file is under 300 lines', () => {
    for (const f of filesUnder(FUNCTIONS)) expect(readFileSync(f, 'utf8').split('\n').length, relative(ROOT, f)).toBeLessThan(300);
  });

  it('the engine does not depend on the function layer', () => {
    const offenders = filesUnder(join(ROOT, 'addin')).filter((f) => /from '(\.\.\/)+functions\//.test(readFileSync(f, 'utf8')));
    expect(offenders).toEqual([]);
  });
});
