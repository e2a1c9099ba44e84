// The custom functions pipeline without webpack: the metadata the plugin generates from
// the JSDoc in functions/, the guard around the associate calls it appends, and the
// allowErrorForDataTypeAny post-processing of functions.json.

import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import { version } from '../../functions/functions';
import packageJson from '../../package.json';

const require = createRequire(import.meta.url);

interface Association {
  sourceFileName: string;
  functionName: string;
  id: string;
}
interface GenerateResult {
  metadataJson: string;
  associate: Association[];
  errors: string[];
}

const { generateCustomFunctionsMetadata } = require('custom-functions-metadata') as {
  generateCustomFunctionsMetadata(input: string[], generateAllowCustomData?: boolean): Promise<GenerateResult>;
};
const { FUNCTION_SOURCES } = require('../../webpack.config.js') as { FUNCTION_SOURCES: string[] };
const { guardAssociations, expectedIds } = require('../../scripts/webpack/guard-associations-loader.cjs') as {
  guardAssociations(source: string): { source: string; ids: string[] };
  expectedIds(result: unknown, file: string): string[] | null;
};
const { allowErrorsForAnyTypedParameters } = require('../../scripts/webpack/functions-metadata.cjs') as {
  allowErrorsForAnyTypedParameters(jsonText: string): string;
};

/** What the metadata plugin's loader appends to a scanned file. */
function appendAssociations(source: string, associations: readonly Association[]): string {
  return associations.reduce((text, a) => `${text}\nCustomFunctions.associate("${a.id}", ${a.functionName});`, source);
}

describe('MOOR.VERSION', () => {
  it('returns the package version', () => {
    expect(version()).toBe(packageJson.version);
    expect(version()).toMatch(/^\d+\.\d+\.\d+/);
  });

  it('is described by the JSDoc the metadata plugin reads', async () => {
    const result = await generateCustomFunctionsMetadata(FUNCTION_SOURCES, true);
    expect(result.errors).toEqual([]);
    const metadata = JSON.parse(result.metadataJson) as { functions: Record<string, unknown>[] };
    const entry = metadata.functions.find((f) => f.id === 'VERSION');
    expect(entry).toMatchObject({
      name: 'VERSION',
      helpUrl: 'https://localhost:3000/docs/functions.md#version',
      parameters: [],
      result: { type: 'string' },
    });
    expect(String(entry!.description)).toMatch(/version of the Mooring add-in/);
    expect(result.associate).toContainEqual(expect.objectContaining({ id: 'VERSION', functionName: 'version' }));
    expect(expectedIds(result, FUNCTION_SOURCES[0]!)).toContain('VERSION');
  });
});

describe('guarding the associate calls', () => {
  const associations: Association[] = [
    { sourceFileName: '/x/functions.ts', functionName: 'version', id: 'VERSION' },
    { sourceFileName: '/x/functions.ts', functionName: 'spread', id: 'SPREAD.HALFLIFE' },
  ];
  const source = appendAssociations(
    'function version() { return "9.9.9"; }\nfunction spread() { return 1; }',
    associations,
  );

  it('wraps every appended call and reports the ids it wrapped', () => {
    const guarded = guardAssociations(source);
    expect(guarded.ids).toEqual(['VERSION', 'SPREAD.HALFLIFE']);
    expect(guarded.source).not.toMatch(/^CustomFunctions\.associate/m);
  });

  it('lets the code load without Office and still registers with it', () => {
    const guarded = guardAssociations(source).source;
    expect(() => runInNewContext(source, {})).toThrow(/CustomFunctions is not defined/);
    expect(() => runInNewContext(guarded, {})).not.toThrow();
    const registered: [string, unknown][] = [];
    runInNewContext(guarded, { CustomFunctions: { associate: (id: string, fn: () => unknown) => registered.push([id, fn()]) } });
    expect(registered).toEqual([
      ['VERSION', '9.9.9'],
      ['SPREAD.HALFLIFE', 1],
    ]);
  });

  it('refuses to leave an unguarded call it does not recognise', () => {
    expect(() => guardAssociations('  CustomFunctions.associate("X", f)')).toThrow(/unguarded/);
  });

  it('matches the plugin results to the file being built', () => {
    const result = { associate: associations, errors: [], metadataJson: '{}' };
    expect(expectedIds(result, '/x/functions.ts')).toEqual(['VERSION', 'SPREAD.HALFLIFE']);
    expect(expectedIds(result, '/y/other.ts')).toEqual([]);
    expect(expectedIds(undefined, '/x/functions.ts')).toBeNull();
  });

  it('each real scanned file, once the plugin has appended its calls (those of that file, as its loader does), guards them all', async () => {
    const result = await generateCustomFunctionsMetadata(FUNCTION_SOURCES, true);
    const seen: string[] = [];
    for (const file of FUNCTION_SOURCES) {
      const own = result.associate.filter((a) => a.sourceFileName === file);
      const guarded = guardAssociations(appendAssociations(readFileSync(file, 'utf8'), own));
      expect(guarded.ids).toEqual(expectedIds(result, file));
      seen.push(...guarded.ids);
    }
    expect(seen.sort()).toEqual(result.associate.map((a) => a.id).sort());
  });
});

describe('functions.json post-processing', () => {
  const generated = JSON.stringify({
    allowCustomDataForDataTypeAny: true,
    functions: [{ id: 'VERSION', name: 'VERSION', parameters: [], result: { type: 'string' } }],
  });

  it('sets allowErrorForDataTypeAny at the top level and keeps the rest', () => {
    const out = JSON.parse(allowErrorsForAnyTypedParameters(generated)) as Record<string, unknown>;
    expect(out.allowErrorForDataTypeAny).toBe(true);
    expect(Object.keys(out)[0]).toBe('allowErrorForDataTypeAny');
    const { allowErrorForDataTypeAny: _added, ...rest } = out;
    expect(rest).toEqual(JSON.parse(generated));
  });

  it('overrides an explicit false', () => {
    const out = JSON.parse(allowErrorsForAnyTypedParameters(JSON.stringify({ ...JSON.parse(generated), allowErrorForDataTypeAny: false })));
    expect(out.allowErrorForDataTypeAny).toBe(true);
  });

  it('rejects metadata that is not JSON or lists no functions', () => {
    expect(() => allowErrorsForAnyTypedParameters('{')).toThrow(/not valid JSON/);
    expect(() => allowErrorsForAnyTypedParameters('[]')).toThrow(/not a JSON object/);
    expect(() => allowErrorsForAnyTypedParameters('{"functions": []}')).toThrow(/no functions/);
  });
});
