/**
 * The functions.json that `npm test` builds before vitest (dist/functions.json): what Excel
 * shows while a user types. Rules from Microsoft's pages:
 * - "Naming guidelines" (custom functions): names start with a letter, have at least three
 *   characters, and must not look like a cell (A1 to XFD1048576, or R1C1 style).
 * - "extensionFunctionParameter object" (manifest schema): a parameter description is at most
 *   128 characters.
 * - "Manually create JSON metadata for custom functions": a result or parameter with
 *   dimensionality "matrix" is a 2-D array; allowErrorForDataTypeAny lets `any` parameters
 *   receive error values; allowCustomDataForDataTypeAny lets functions return entity values.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { manifestNamespace } from '../../scripts/make-function-docs.mjs';

interface Parameter {
  name: string;
  description?: string;
  type?: string;
  dimensionality?: string;
  optional?: boolean;
}
interface FunctionEntry {
  id: string;
  name: string;
  description?: string;
  helpUrl?: string;
  parameters: Parameter[];
  result: { type?: string; dimensionality?: string };
}
const metadata = JSON.parse(readFileSync(new URL('../../dist/functions.json', import.meta.url), 'utf8')) as {
  allowErrorForDataTypeAny?: boolean;
  allowCustomDataForDataTypeAny?: boolean;
  functions: FunctionEntry[];
};

/** The formula surface: each function's arguments ("?" optional, "[]" a range) and whether it spills. */
const SURFACE: Record<string, { args: string[]; spills: boolean }> = {
  VERSION: { args: [], spills: false },
  ADF: { args: ['series[]', 'deterministic?', 'lags?', 'show?', 'prep?'], spills: true },
  KPSS: { args: ['series[]', 'deterministic?', 'bandwidth?', 'show?', 'prep?'], spills: true },
  PHILLIPSPERRON: { args: ['series[]', 'deterministic?', 'bandwidth?', 'show?', 'prep?'], spills: true },
  ORDER: { args: ['series[]', 'alpha?', 'deterministic?', 'test?', 'prep?'], spills: true },
  GLSROOT: { args: ['series[]', 'deterministic?', 'lags?', 'show?', 'prep?'], spills: true },
  MSTATS: { args: ['series[]', 'deterministic?', 'lags?', 'show?', 'prep?'], spills: true },
  ENGLEGRANGER: { args: ['y[]', 'x[]', 'deterministic?', 'lags?', 'show?', 'prep?'], spills: true },
  PHILLIPSOULIARIS: { args: ['y[]', 'x[]', 'deterministic?', 'bandwidth?', 'show?', 'prep?'], spills: true },
  JOHANSEN: { args: ['block[]', 'lags?', 'deterministic?', 'show?', 'prep?'], spills: true },
  RANK: { args: ['block[]', 'lags?', 'deterministic?', 'alpha?', 'prep?'], spills: false },
  HEDGE: { args: ['y[]', 'x[]', 'method?', 'show?', 'prep?'], spills: false },
  SPREAD: { args: ['y[]', 'x[]', 'beta?', 'prep?'], spills: true },
  HALFLIFE: { args: ['y[]', 'x[]?', 'show?', 'prep?'], spills: true },
  ZSCORE: { args: ['y[]', 'x[]?', 'window?', 'prep?'], spills: true },
  ECM: { args: ['y[]', 'x[]', 'lags?', 'show?', 'prep?'], spills: true },
  GRANGER: { args: ['cause[]', 'effect[]', 'lags?', 'method?', 'show?', 'prep?'], spills: true },
  VARLAGS: { args: ['block[]', 'criterion?', 'maxlags?', 'prep?'], spills: false },
  SCREEN: { args: ['block[]', 'alpha?', 'show?', 'prep?'], spills: true },
  ROLLING: { args: ['y[]', 'x[]', 'window', 'step?', 'show?', 'prep?'], spills: true },
  CRIT: { args: ['test', 'observations?', 'variables?', 'deterministic?', 'level?'], spills: false },
  COMMONDATES: { args: ['first[]', 'second[]', 'fillforward?'], spills: true },
  MOVINGHEDGE: { args: ['y[]', 'x[]', 'show?', 'statevar?', 'obsvar?', 'prep?'], spills: true },
  LEVELBOUNDS: { args: ['y[]', 'x[]', 'boundscase?', 'lags?', 'order?', 'show?', 'prep?'], spills: true },
  RELATIONIS: { args: ['block[]', 'weights[]', 'lags?', 'deterministic?', 'show?', 'prep?'], spills: true },
  ADJUSTS: { args: ['block[]', 'series?', 'lags?', 'deterministic?', 'show?', 'prep?'], spills: true },
  AHEAD: { args: ['block[]', 'horizon', 'rank?', 'lags?', 'deterministic?', 'show?', 'prep?'], spills: true },
};

function argsOf(f: FunctionEntry): string[] {
  return f.parameters.map((p) => `${p.name}${p.dimensionality === 'matrix' ? '[]' : ''}${p.optional ? '?' : ''}`);
}

describe('dist/functions.json', () => {
  it('lists exactly the functions of the formula surface', () => {
    expect(metadata.functions.map((f) => f.name).sort()).toEqual(Object.keys(SURFACE).sort());
  });

  for (const f of metadata.functions) {
    describe(`MOOR.${f.name}`, () => {
      it('has the arguments, optional flags and result shape of the surface', () => {
        expect(argsOf(f)).toEqual(SURFACE[f.name].args);
        expect(f.result.dimensionality === 'matrix').toBe(SURFACE[f.name].spills);
      });
      it('has a one-line description, a described default for each optional argument, and its help anchor', () => {
        expect(f.description).toMatch(/^[A-Z].{20,160}[.?]$/);
        expect(f.description).not.toContain('\n');
        for (const p of f.parameters) {
          expect(p.description, p.name).toBeTruthy();
          expect(p.description!.length, p.name).toBeLessThanOrEqual(128);
          if (p.optional) expect(p.description, p.name).toMatch(/Default/);
        }
        expect(f.helpUrl).toBe(`https://localhost:3000/docs/functions.html#${f.name.toLowerCase()}`);
      });
      it('takes ranges untyped (any, matrix), so blanks stay blanks and errors reach the cleaner', () => {
        for (const p of f.parameters) expect(p.type ?? 'any', p.name).toBe('any');
      });
    });
  }

  it('names follow one scheme: upper-case letters, at least three, not a cell reference', () => {
    for (const f of metadata.functions) {
      expect(f.name).toMatch(/^[A-Z][A-Z]{2,}$/);
      expect(f.id).toBe(f.name);
      const a1 = /^([A-Z]{1,3})(\d+)$/.exec(f.name);
      expect(a1, f.name).toBeNull();
      expect(f.name).not.toMatch(/^R\d*C\d*$/);
    }
  });

  it('no two functions share a name or an id', () => {
    const names = metadata.functions.map((f) => f.name);
    expect(new Set(names).size).toBe(names.length);
    expect(new Set(metadata.functions.map((f) => f.id)).size).toBe(names.length);
  });

  it('allows error values into any-typed parameters and entity values out of the functions', () => {
    expect(metadata.allowErrorForDataTypeAny).toBe(true);
    expect(metadata.allowCustomDataForDataTypeAny).toBe(true);
  });

  it('the namespace is the manifest\'s', () => {
    expect(manifestNamespace()).toBe('MOOR');
    expect(manifestNamespace(readFileSync(new URL('../../dist/manifest.xml', import.meta.url), 'utf8'))).toBe('MOOR');
  });
});
