/**
 * Finds the browser the end-to-end tests drive, in this order:
 *   1. MOORING_BROWSER: a path to a Chromium, Chrome or Edge executable (the word `packaged`
 *      skips straight to step 3);
 *   2. a Chromium, Chrome or Edge installed in the usual place for Linux, macOS or Windows;
 *   3. the headless Chromium that the dev dependency @sparticuz/chromium carries inside its
 *      registry tarball (Linux x64 only), unpacked once into node_modules/.cache/.
 * Nothing is downloaded: `npm ci` brings step 3 from the npm registry like any other package.
 * When none is found the caller throws; the browser tests never skip.
 */
import { accessSync, constants, createReadStream, createWriteStream, existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { delimiter, dirname, join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { fileURLToPath } from 'node:url';
import { brotliDecompressSync, createBrotliDecompress } from 'node:zlib';

/** The browser chosen, and how. */
export interface FoundBrowser {
  executablePath: string;
  /** Where it came from, for messages: 'MOORING_BROWSER', 'installed' or 'packaged'. */
  source: 'MOORING_BROWSER' | 'installed' | 'packaged';
  /** Extra environment for the browser process (the packaged one's font configuration). */
  env: Record<string, string>;
}

/** Where a machine keeps the inputs that decide the search. */
export interface SearchPlace {
  platform: NodeJS.Platform;
  arch: string;
  env: NodeJS.ProcessEnv;
}

/** This machine. */
export const THIS_MACHINE: SearchPlace = { platform: process.platform, arch: process.arch, env: process.env };

/** The package whose tarball carries a Chromium binary. */
export const PACKAGED_BROWSER = '@sparticuz/chromium';

const CACHE = fileURLToPath(new URL('../../node_modules/.cache/mooring-browser/', import.meta.url));

/**
 * The usual install locations of Chromium, Chrome and Edge on the given platform, most likely
 * first; on Linux and macOS also the same names looked up on PATH.
 */
export function installedCandidates(place: SearchPlace): string[] {
  const { platform, env } = place;
  if (platform === 'win32') {
    const roots = [env.PROGRAMFILES, env['PROGRAMFILES(X86)'], env.LOCALAPPDATA].filter((r): r is string => !!r);
    const tails = ['Google\\Chrome\\Application\\chrome.exe', 'Microsoft\\Edge\\Application\\msedge.exe', 'Chromium\\Application\\chrome.exe'];
    return tails.flatMap((t) => roots.map((r) => `${r}\\${t}`));
  }
  if (platform === 'darwin') {
    const apps = ['Google Chrome.app/Contents/MacOS/Google Chrome', 'Chromium.app/Contents/MacOS/Chromium', 'Microsoft Edge.app/Contents/MacOS/Microsoft Edge'];
    const roots = ['/Applications', ...(env.HOME ? [`${env.HOME}/Applications`] : [])];
    return apps.flatMap((a) => roots.map((r) => `${r}/${a}`));
  }
  const names = ['chromium', 'chromium-browser', 'google-chrome', 'google-chrome-stable', 'microsoft-edge', 'microsoft-edge-stable'];
  const fixed = ['/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome', '/usr/bin/google-chrome-stable', '/opt/google/chrome/chrome', '/usr/bin/microsoft-edge', '/opt/microsoft/msedge/msedge', '/snap/bin/chromium'];
  const onPath = (env.PATH ?? '').split(delimiter).filter(Boolean).flatMap((d) => names.map((n) => join(d, n)));
  return [...new Set([...fixed, ...onPath])];
}

function isExecutable(path: string, platform: NodeJS.Platform): boolean {
  try {
    accessSync(path, platform === 'win32' ? constants.F_OK : constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** Steps 1 and 2: the explicit path, else the first installed browser; null when neither. */
export function findInstalledBrowser(place: SearchPlace): FoundBrowser | null {
  const explicit = place.env.MOORING_BROWSER?.trim();
  if (explicit && explicit !== 'packaged') {
    if (!isExecutable(explicit, place.platform)) throw new Error(`MOORING_BROWSER is ${explicit}, which is not an executable file: give the full path to a Chromium, Chrome or Edge executable, the word 'packaged', or unset it.`);
    return { executablePath: explicit, source: 'MOORING_BROWSER', env: {} };
  }
  if (explicit === 'packaged') return null;
  const hit = installedCandidates(place).find((p) => isExecutable(p, place.platform));
  return hit ? { executablePath: hit, source: 'installed', env: {} } : null;
}

/** The packaged browser's folder inside node_modules and its version, or null when not installed. */
export function packagedBrowserFiles(): { bin: string; version: string } | null {
  let main: string;
  try {
    main = createRequire(import.meta.url).resolve(PACKAGED_BROWSER);
  } catch {
    return null;
  }
  const root = join(dirname(main), '..');
  const version = (JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { version: string }).version;
  return { bin: join(root, 'bin'), version };
}

/** Writes the files of a plain (ustar) tar archive under `into`. */
function untar(archive: Buffer, into: string): void {
  for (let at = 0; at + 512 <= archive.length; ) {
    const header = archive.subarray(at, at + 512);
    if (header.every((b) => b === 0)) break;
    const text = (from: number, length: number) => header.toString('utf8', from, from + length).replace(/\0.*$/s, '');
    const size = parseInt(text(124, 12).trim() || '0', 8);
    const prefix = text(345, 155);
    const name = (prefix ? `${prefix}/` : '') + text(0, 100);
    const type = text(156, 1);
    const target = join(into, name);
    if (!target.startsWith(into) || name.includes('..')) throw new Error(`Unexpected path ${name} in the packaged browser's fonts.`);
    if (type === '5') mkdirSync(target, { recursive: true });
    else if (type === '0' || type === '') {
      mkdirSync(dirname(target), { recursive: true });
      writeFileSync(target, archive.subarray(at + 512, at + 512 + size));
    }
    at += 512 + Math.ceil(size / 512) * 512;
  }
}

/**
 * Step 3: unpacks the packaged Chromium (once per version; a second caller finds it ready) and
 * its fonts, with a font configuration that reads the system's fonts where there are any and
 * the packaged Open Sans everywhere. Null when the package is absent or the platform is not
 * the one its binary is built for.
 */
export async function unpackPackagedBrowser(place: SearchPlace): Promise<FoundBrowser | null> {
  if (place.platform !== 'linux' || place.arch !== 'x64') return null;
  const files = packagedBrowserFiles();
  if (!files) return null;
  const dir = join(CACHE, `chromium-${files.version}`);
  const executablePath = join(dir, 'chromium');
  const fontsConf = join(dir, 'fonts.conf');
  if (!existsSync(executablePath) || !existsSync(fontsConf)) {
    mkdirSync(dir, { recursive: true });
    // Unpack beside the final name and rename, so parallel test workers never run half a file.
    const partial = `${executablePath}.${process.pid}.partial`;
    await pipeline(createReadStream(join(files.bin, 'chromium.br')), createBrotliDecompress(), createWriteStream(partial, { mode: 0o755 }));
    renameSync(partial, executablePath);
    const fonts = join(dir, 'fonts');
    untar(brotliDecompressSync(readFileSync(join(files.bin, 'fonts.tar.br'))), fonts);
    const conf = [
      '<?xml version="1.0"?>',
      '<!DOCTYPE fontconfig SYSTEM "fonts.dtd">',
      '<fontconfig>',
      '  <include ignore_missing="yes">/etc/fonts/fonts.conf</include>',
      `  <dir>${fonts}</dir>`,
      `  <cachedir>${join(dir, 'fonts-cache')}</cachedir>`,
      '</fontconfig>',
      '',
    ].join('\n');
    writeFileSync(`${fontsConf}.${process.pid}.partial`, conf);
    renameSync(`${fontsConf}.${process.pid}.partial`, fontsConf);
  }
  return { executablePath, source: 'packaged', env: { FONTCONFIG_FILE: fontsConf, ...plainLocale(place.env) } };
}

/**
 * Under the C or POSIX locale (LANG=C.UTF-8, usual on CI machines and containers) the packaged
 * build reports navigator.language as 'en-US@posix', which Intl rejects as a language tag and
 * the pane's components then fail on; a full Chromium reports 'en-US'. Such machines get
 * en_US.UTF-8 for the browser process; any other locale is left as the user set it.
 */
export function plainLocale(env: NodeJS.ProcessEnv): Record<string, string> {
  const locale = env.LC_ALL || env.LC_MESSAGES || env.LANG || '';
  return locale === '' || /^(C|POSIX)([.@]|$)/.test(locale) ? { LANG: 'en_US.UTF-8', LC_ALL: 'en_US.UTF-8' } : {};
}

/** The three steps in order; throws, naming what was tried, when no browser is found. */
export async function findBrowser(place: SearchPlace = THIS_MACHINE): Promise<FoundBrowser> {
  const installed = findInstalledBrowser(place);
  if (installed) return installed;
  const packaged = await unpackPackagedBrowser(place);
  if (packaged) return packaged;
  const where = place.env.MOORING_BROWSER?.trim() === 'packaged' ? 'MOORING_BROWSER=packaged asked for the packaged one only' : `none of ${installedCandidates(place).length} usual install paths holds Chromium, Chrome or Edge`;
  throw new Error(
    `No browser for the end-to-end tests: ${where}, and ${PACKAGED_BROWSER} ` +
      (place.platform === 'linux' && place.arch === 'x64' ? 'is not installed (run npm ci).' : `carries a Linux x64 build only (this is ${place.platform} ${place.arch}).`) +
      ' Install Chrome, Edge or Chromium, or set MOORING_BROWSER to a browser executable.',
  );
}
