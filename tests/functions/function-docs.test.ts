/**
 * docs/functions.md is generated from the same JSDoc metadata as functions.json by
 * scripts/make-function-docs.mjs; the committed page must be what the script writes now, and
 * every help link must land on a section of it.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DOCS_FILE, generatedMetadata, manifestNamespace, renderFunctionDocs } from '../../scripts/make-function-docs.mjs';

describe('docs/functions.md', () => {
  it('is what the generator writes from the current JSDoc (run npm run docs:functions after editing functions/functions.ts)', async () => {
    const expected = renderFunctionDocs(await generatedMetadata(), manifestNamespace());
    expect(readFileSync(DOCS_FILE, 'utf8')).toBe(expected);
  });

  it('has a section for every help link, with the signature and each argument', async () => {
    const metadata = (await generatedMetadata()) as { functions: { name: string; helpUrl: string; parameters: { name: string }[] }[] };
    const page = readFileSync(DOCS_FILE, 'utf8');
    for (const f of metadata.functions) {
      const anchor = f.helpUrl.split('#')[1];
      expect(page).toContain(`<a id="${anchor}"></a>`);
      expect(page).toContain(`### MOOR.${f.name}`);
      for (const p of f.parameters) expect(page).toContain(`| \`${p.name}\` |`);
    }
    expect(page).toContain('=MOOR.ENGLEGRANGER(y, x, [deterministic], [lags], [show], [prep])');
  });

  it('is served with the add-in beside the HTML page the help links open (the build copies docs/*.md to dist/docs/)', () => {
    expect(readFileSync(new URL('../../dist/docs/functions.md', import.meta.url), 'utf8')).toBe(readFileSync(DOCS_FILE, 'utf8'));
  });

  it('renders optional arguments in brackets and escapes table bars', () => {
    const text = renderFunctionDocs(
      { functions: [{ name: 'DEMO', description: 'a | b', helpUrl: 'x#demo', parameters: [{ name: 'r', description: 'one', dimensionality: 'matrix' }, { name: 'o', description: 'two', optional: true }], result: {} }] },
      'NS',
    );
    expect(text).toContain('=NS.DEMO(r, [o])');
    expect(text).toContain('a \\| b');
    expect(text).toContain('| `r` | required range | one |');
    expect(text).toContain('| `o` | optional value | two |');
  });
});
