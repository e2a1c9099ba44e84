// Static checks of the build machinery: the add-in manifest, the webpack configurations,
// the HTML pages and the icons. Nothing here runs webpack.

import { spawnSync } from 'node:child_process';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { beforeAll, describe, expect, it } from 'vitest';
import packageJson from '../../package.json';

const require = createRequire(import.meta.url);
const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const ORIGIN = 'https://localhost:3000/';
const MANIFEST_TEXT = readFileSync(join(ROOT, 'manifest', 'manifest.xml'), 'utf8');

// ---------------------------------------------------------------------------
// A small element tree over fast-xml-parser's order-preserving output.

interface XmlNode {
  readonly name: string; // without namespace prefix
  readonly attrs: Readonly<Record<string, string>>; // names without namespace prefix
  readonly children: readonly XmlNode[];
  readonly text: string;
}

type Ordered = Record<string, unknown>;

function toNodes(items: readonly Ordered[]): XmlNode[] {
  const nodes: XmlNode[] = [];
  for (const item of items) {
    const name = Object.keys(item).find((k) => k !== ':@');
    if (name === undefined || name === '#text' || name === '?xml' || name === '#comment') continue;
    const rawAttrs = (item[':@'] ?? {}) as Record<string, unknown>;
    const attrs = Object.fromEntries(Object.entries(rawAttrs).map(([k, v]) => [k.replace(/^@_/, ''), String(v)]));
    const inner = item[name] as Ordered[];
    const text = inner
      .filter((c) => '#text' in c)
      .map((c) => String(c['#text']))
      .join('')
      .trim();
    nodes.push({ name, attrs, children: toNodes(inner), text });
  }
  return nodes;
}

function parseManifest(xml: string): XmlNode {
  const parser = new XMLParser({
    preserveOrder: true,
    ignoreAttributes: false,
    attributeNamePrefix: '@_',
    removeNSPrefix: true,
    parseTagValue: false,
    parseAttributeValue: false,
    trimValues: true,
  });
  const roots = toNodes(parser.parse(xml) as Ordered[]);
  expect(roots).toHaveLength(1);
  return roots[0]!;
}

function child(node: XmlNode, name: string): XmlNode {
  const found = node.children.filter((c) => c.name === name);
  if (found.length !== 1) throw new Error(`<${node.name}> has ${found.length} <${name}> children, expected 1`);
  return found[0]!;
}

function path(node: XmlNode, ...names: string[]): XmlNode {
  return names.reduce(child, node);
}

function descendants(node: XmlNode): XmlNode[] {
  return node.children.flatMap((c) => [c, ...descendants(c)]);
}

/** Children names are in the documented relative order (absent ones skipped). */
function expectOrder(node: XmlNode, order: readonly string[]): void {
  const names = node.children.map((c) => c.name);
  for (const name of names) expect(order, `<${name}> under <${node.name}>`).toContain(name);
  const positions = names.map((n) => order.indexOf(n));
  expect(positions, `children of <${node.name}>: ${names.join(', ')}`).toEqual([...positions].sort((a, b) => a - b));
}

function pngSize(file: string): { width: number; height: number } {
  const bytes = readFileSync(file);
  expect(bytes.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  expect(bytes.subarray(12, 16).toString('ascii')).toBe('IHDR');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

// ---------------------------------------------------------------------------

interface WebpackConfig {
  name: string;
  target: unknown;
  entry: Record<string, string | string[]>;
  output: { path: string; filename: string };
  plugins: object[];
  devServer?: unknown;
}

const webpackConfigModule = require('../../webpack.config.js') as ((
  env: Record<string, unknown>,
  argv: Record<string, unknown>,
) => Promise<WebpackConfig[]>) & {
  FUNCTION_SOURCES: string[];
  ADDIN_FILES: Record<'pane' | 'functionsPage' | 'functionsScript' | 'functionsMetadata', string>;
};
const { ADDIN_FILES, FUNCTION_SOURCES } = webpackConfigModule;

describe('manifest/manifest.xml', () => {
  let app: XmlNode;
  let host: XmlNode;
  let urls: Map<string, string>;
  let runtimeResid: string;

  beforeAll(() => {
    app = parseManifest(MANIFEST_TEXT);
    host = path(app, 'VersionOverrides', 'Hosts', 'Host');
    urls = new Map(path(app, 'VersionOverrides', 'Resources', 'Urls').children.map((u) => [u.attrs.id!, u.attrs.DefaultValue!]));
    runtimeResid = path(host, 'Runtimes', 'Runtime').attrs.resid!;
  });

  it('is well-formed XML', () => {
    expect(XMLValidator.validate(MANIFEST_TEXT)).toBe(true);
  });

  it('is an add-in only task pane manifest for Excel workbooks with its own identity', () => {
    expect(app.name).toBe('OfficeApp');
    const openingTag = /<OfficeApp\b[^>]*>/.exec(MANIFEST_TEXT)![0];
    expect(openingTag).toContain('xmlns="http://schemas.microsoft.com/office/appforoffice/1.1"');
    expect(app.attrs.type).toBe('TaskPaneApp');
    const id = child(app, 'Id').text;
    expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(child(app, 'ProviderName').text).toBe('Mooring');
    expect(child(app, 'DisplayName').attrs.DefaultValue).toBe('Mooring');
    expect(path(app, 'Hosts', 'Host').attrs.Name).toBe('Workbook');
    expect(host.attrs.type).toBe('Workbook');
  });

  it('carries the package version', () => {
    expect(child(app, 'Version').text).toBe(`${packageJson.version}.0`);
  });

  it('asks for ReadWriteDocument and declares no AppDomains', () => {
    expect(child(app, 'Permissions').text).toBe('ReadWriteDocument');
    expect(descendants(app).some((n) => n.name === 'AppDomains' || n.name === 'AppDomain')).toBe(false);
  });

  it('requires the shared runtime 1.1 and runs it long-lived from the pane page', () => {
    const sets = path(app, 'Requirements', 'Sets').children;
    expect(sets.map((s) => [s.attrs.Name, s.attrs.MinVersion])).toContainEqual(['SharedRuntime', '1.1']);
    const runtime = path(host, 'Runtimes', 'Runtime');
    expect(runtime.attrs.lifetime).toBe('long');
    expect(urls.get(runtimeResid)).toBe(`${ORIGIN}${ADDIN_FILES.pane}`);
    expect(child(path(app, 'DefaultSettings'), 'SourceLocation').attrs.DefaultValue).toBe(`${ORIGIN}${ADDIN_FILES.pane}`);
  });

  it('registers custom functions under MOOR from the built script and metadata, in the shared page', () => {
    const point = path(host, 'AllFormFactors', 'ExtensionPoint');
    expect(point.attrs.type).toBe('CustomFunctions');
    expect(urls.get(path(point, 'Script', 'SourceLocation').attrs.resid!)).toBe(`${ORIGIN}${ADDIN_FILES.functionsScript}`);
    expect(urls.get(path(point, 'Metadata', 'SourceLocation').attrs.resid!)).toBe(`${ORIGIN}${ADDIN_FILES.functionsMetadata}`);
    expect(path(point, 'Page', 'SourceLocation').attrs.resid).toBe(runtimeResid);
    const namespaceResid = child(point, 'Namespace').attrs.resid!;
    const shortStrings = path(app, 'VersionOverrides', 'Resources', 'ShortStrings').children;
    expect(shortStrings.find((s) => s.attrs.id === namespaceResid)?.attrs.DefaultValue).toBe('MOOR');
  });

  it('puts one button on the Home tab that opens the pane in the shared runtime', () => {
    const desktop = child(host, 'DesktopFormFactor');
    expect(child(desktop, 'FunctionFile').attrs.resid).toBe(runtimeResid);
    const surface = child(desktop, 'ExtensionPoint');
    expect(surface.attrs.type).toBe('PrimaryCommandSurface');
    const tab = child(surface, 'OfficeTab');
    expect(tab.attrs.id).toBe('TabHome');
    const controls = descendants(tab).filter((n) => n.name === 'Control');
    expect(controls).toHaveLength(1);
    expect(controls[0]!.attrs.type).toBe('Button');
    const action = child(controls[0]!, 'Action');
    expect(action.attrs.type).toBe('ShowTaskpane');
    expect(child(action, 'TaskpaneId').text).not.toBe('');
    expect(child(action, 'SourceLocation').attrs.resid).toBe(runtimeResid);
  });

  it('resolves every resid to a unique resource id of at most 32 characters', () => {
    const resources = path(app, 'VersionOverrides', 'Resources');
    const ids = resources.children.flatMap((group) => group.children.map((r) => r.attrs.id!));
    expect(new Set(ids).size).toBe(ids.length);
    const resids = descendants(path(app, 'VersionOverrides', 'Hosts')).flatMap((n) => (n.attrs.resid ? [n.attrs.resid] : []));
    expect(resids.length).toBeGreaterThan(10);
    for (const resid of resids) {
      expect(ids, resid).toContain(resid);
      expect(resid.length, resid).toBeLessThanOrEqual(32);
    }
  });

  it('points every URL at a file the build emits under the development origin', () => {
    const built = new Set(Object.values(ADDIN_FILES));
    const icons = new Set(readdirSync(join(ROOT, 'assets')).map((f) => `assets/${f}`));
    const all = descendants(app).flatMap((n) => (n.attrs.DefaultValue?.startsWith('http') ? [n.attrs.DefaultValue] : []));
    expect(all.length).toBeGreaterThanOrEqual(9);
    for (const url of all) {
      expect(url.startsWith(ORIGIN), url).toBe(true);
      const file = url.slice(ORIGIN.length);
      expect(built.has(file) || icons.has(file), url).toBe(true);
    }
  });

  it('uses icons of the sizes it declares: 16, 32 and 80 px for commands, 32 and 64 px for the listing', () => {
    const images = new Map(path(app, 'VersionOverrides', 'Resources', 'Images').children.map((i) => [i.attrs.id!, i.attrs.DefaultValue!]));
    const iconSets = descendants(host).filter((n) => n.name === 'Icon');
    expect(iconSets.length).toBeGreaterThan(0);
    for (const icon of iconSets) {
      expect(icon.children.map((i) => i.attrs.size).sort()).toEqual(['16', '32', '80']);
      for (const image of icon.children) {
        const file = join(ROOT, images.get(image.attrs.resid!)!.slice(ORIGIN.length));
        const size = Number(image.attrs.size);
        expect(pngSize(file)).toEqual({ width: size, height: size });
      }
    }
    const listing: [string, number][] = [
      ['IconUrl', 32],
      ['HighResolutionIconUrl', 64],
    ];
    for (const [element, size] of listing) {
      const file = join(ROOT, child(app, element).attrs.DefaultValue!.slice(ORIGIN.length));
      expect(pngSize(file), element).toEqual({ width: size, height: size });
    }
  });

  it('keeps elements in the order the schema requires', () => {
    expectOrder(app, [
      'Id', 'AlternateId', 'Version', 'ProviderName', 'DefaultLocale', 'DisplayName', 'Description', 'IconUrl',
      'HighResolutionIconUrl', 'SupportUrl', 'AppDomains', 'Hosts', 'Requirements', 'DefaultSettings', 'Permissions',
      'Dictionary', 'VersionOverrides', 'ExtendedOverrides',
    ]);
    expectOrder(child(app, 'VersionOverrides'), ['Description', 'Requirements', 'Hosts', 'Resources', 'WebApplicationInfo']);
    expectOrder(host, ['Runtimes', 'AllFormFactors', 'DesktopFormFactor']);
    expectOrder(path(host, 'AllFormFactors', 'ExtensionPoint'), ['Script', 'Page', 'Metadata', 'Namespace']);
    expectOrder(child(host, 'DesktopFormFactor'), ['GetStarted', 'FunctionFile', 'ExtensionPoint']);
    expectOrder(path(app, 'VersionOverrides', 'Resources'), ['Images', 'Urls', 'ShortStrings', 'LongStrings']);
  });

  it('checks fail on a manifest that breaks them', () => {
    const broken = MANIFEST_TEXT.replace('<Permissions>ReadWriteDocument</Permissions>', '');
    expect(() => child(parseManifest(broken), 'Permissions')).toThrow(/0 <Permissions>/);
    expect(XMLValidator.validate(MANIFEST_TEXT.replace('</Hosts>', ''))).not.toBe(true);
    const swapped = parseManifest(MANIFEST_TEXT.replace('<ProviderName>Mooring</ProviderName>', '').replace('</DefaultLocale>', '</DefaultLocale><ProviderName>Mooring</ProviderName>'));
    expect(() => expectOrder(swapped, ['Id', 'Version', 'ProviderName', 'DefaultLocale', 'DisplayName', 'Description', 'IconUrl', 'HighResolutionIconUrl', 'Hosts', 'Requirements', 'DefaultSettings', 'Permissions', 'VersionOverrides'])).toThrow();
  });
});

describe('webpack.config.js', () => {
  let configs: WebpackConfig[];

  beforeAll(async () => {
    configs = await webpackConfigModule({}, { mode: 'production' });
  });

  it('exports the configurations cli and addin', () => {
    expect(configs.map((c) => c.name)).toEqual(['cli', 'addin']);
  });

  it('builds the command line for Node into dist/cli/mooring.js behind a #! line', () => {
    const cli = configs.find((c) => c.name === 'cli')!;
    expect(String(cli.target)).toMatch(/^node/);
    expect(cli.entry).toEqual({ mooring: './addin/cli/main.ts' });
    expect(cli.output.path).toBe(join(ROOT, 'dist', 'cli'));
    expect(cli.output.filename).toBe('mooring.js');
    expect(join('dist', 'cli', cli.output.filename)).toBe(join(packageJson.bin.mooring));
    const banner = cli.plugins.find((p) => p.constructor.name === 'BannerPlugin') as { options: { banner: string; raw: boolean } };
    expect(banner.options).toMatchObject({ banner: '#!/usr/bin/env node', raw: true });
  });

  it('builds the add-in files the manifest names', () => {
    const addin = configs.find((c) => c.name === 'addin')!;
    expect(addin.output.path).toBe(join(ROOT, 'dist'));
    expect(addin.output.filename).toBe('[name].js');
    // The manifest's bundles, plus the preview page's (npm run preview; never named by the manifest)
    // and MOOR.SCREEN's Web Worker, which functions.js starts by this name beside the page.
    expect(Object.keys(addin.entry).map((name) => `${name}.js`)).toEqual([ADDIN_FILES.functionsScript, 'taskpane.js', 'preview.js', 'screen-cells-worker.js']);
    expect(addin.entry.functions).toEqual(FUNCTION_SOURCES);
    expect(FUNCTION_SOURCES).toContain(join(ROOT, 'functions', 'functions.ts'));

    const pages = addin.plugins
      .filter((p) => p.constructor.name === 'HtmlWebpackPlugin')
      .map((p) => (p as { userOptions: { filename: string; chunks: string[] } }).userOptions);
    expect(pages).toContainEqual(expect.objectContaining({ filename: ADDIN_FILES.pane, chunks: ['functions', 'taskpane'] }));
    expect(pages).toContainEqual(expect.objectContaining({ filename: ADDIN_FILES.functionsPage, chunks: ['functions'] }));

    const metadata = addin.plugins.find((p) => p.constructor.name === 'CustomFunctionsMetadataPlugin') as {
      options: { input: string[]; output: string };
    };
    expect(metadata.options).toEqual({ input: FUNCTION_SOURCES, output: ADDIN_FILES.functionsMetadata });
    expect(addin.plugins.some((p) => p.constructor.name === 'FunctionsMetadataPostProcessPlugin')).toBe(true);
    expect(addin.devServer).toBeUndefined();
  });
});

describe('HTML pages', () => {
  const pages = ['taskpane/taskpane.html', 'functions/functions.html'];
  const OFFICE_JS = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';

  it.each(pages)('%s allows scripts only from itself and the Office.js CDN', (page) => {
    const html = readFileSync(join(ROOT, page), 'utf8');
    const head = html.slice(html.indexOf('<head>'), html.indexOf('</head>'));
    const csp = /<meta\s+http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(head);
    expect(csp).not.toBeNull();
    expect(head.indexOf('Content-Security-Policy')).toBeLessThan(head.indexOf('<script'));
    const directives = new Map(
      csp![1]!
        .split(';')
        .map((d) => d.trim().split(/\s+/))
        .map(([name, ...values]) => [name!, values]),
    );
    expect(directives.get('default-src')).toEqual(["'self'"]);
    expect(directives.get('script-src')).toEqual(["'self'", 'https://appsforoffice.microsoft.com']);
    for (const [name, values] of directives) {
      for (const value of values) {
        expect(["'self'", "'none'", 'data:', 'https://appsforoffice.microsoft.com'], `${name} ${value}`).toContain(value);
      }
      if (name !== 'script-src') expect(values, name).not.toContain('https://appsforoffice.microsoft.com');
    }
    const scripts = [...head.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts).toEqual([`<script src="${OFFICE_JS}">`]);
    // Nothing else is fetched from outside: no CDN styles, fonts or images.
    const external = [...html.matchAll(/(?:src|href)="(https?:[^"]+)"/g)].map((m) => m[1]);
    expect(external).toEqual([OFFICE_JS]);
  });

  it('the pane stylesheet fetches nothing from elsewhere', () => {
    const css = readFileSync(join(ROOT, 'taskpane', 'taskpane.css'), 'utf8');
    expect(css).not.toMatch(/@import|url\(|https?:/);
  });

  it('no page script writes markup from strings', () => {
    const sources = ['taskpane', 'functions'].flatMap((dir) =>
      readdirSync(join(ROOT, dir))
        .filter((f) => f.endsWith('.ts'))
        .map((f) => join(ROOT, dir, f)),
    );
    expect(sources.length).toBeGreaterThanOrEqual(4);
    for (const file of sources) {
      expect(readFileSync(file, 'utf8'), file).not.toMatch(/innerHTML|outerHTML|insertAdjacentHTML|document\.write/);
    }
  });
});

describe('icons and CI', () => {
  it('the committed PNGs are what manifest/make-icons.mjs draws', () => {
    const result = spawnSync(process.execPath, [join(ROOT, 'manifest', 'make-icons.mjs'), '--check'], { encoding: 'utf8' });
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    for (const size of [16, 32, 64, 80, 128]) {
      expect(pngSize(join(ROOT, 'assets', `icon-${size}.png`))).toEqual({ width: size, height: size });
    }
  });

  it('.ci/run is an executable strict bash script that installs and tests', () => {
    const file = join(ROOT, '.ci', 'run');
    expect(statSync(file).mode & 0o111).not.toBe(0);
    const text = readFileSync(file, 'utf8');
    expect(text.startsWith('#!/usr/bin/env bash\n')).toBe(true);
    expect(text).toMatch(/^set -euo pipefail$/m);
    const commands = text.split('\n').filter((l) => /^npm /.test(l));
    expect(commands).toEqual(['npm ci', 'npm test']);
    expect(text).toMatch(/if \[ ! -x \/usr\/bin\/chromium \]; then\n(?:.*\n)*?\s+apt-get update\n\s+apt-get install -y [^\n]*chromium/);
  });
});
