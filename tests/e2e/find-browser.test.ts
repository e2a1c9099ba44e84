import { describe, expect, it } from 'vitest';
import { findBrowser, findInstalledBrowser, installedCandidates, packagedBrowserFiles, THIS_MACHINE } from './find-browser';
import { launchBrowser } from './browser';

// How the end-to-end tests find their browser. The install locations are the vendors' default
// ones (Chrome and Edge installers, Debian and Ubuntu packages); the packaged browser is the one
// inside the @sparticuz/chromium tarball, started here the way the pane's walk starts it.

const linuxX64 = process.platform === 'linux' && process.arch === 'x64';

describe('the browser finder', () => {
  it('looks for Chrome and Edge where their Windows installers put them, per machine and per user', () => {
    const found = installedCandidates({ platform: 'win32', arch: 'x64', env: { PROGRAMFILES: 'C:\\Program Files', 'PROGRAMFILES(X86)': 'C:\\Program Files (x86)', LOCALAPPDATA: 'C:\\Users\\a\\AppData\\Local' } });
    expect(found).toContain('C:\\Program Files\\Google\\Chrome\\Application\\chrome.exe');
    expect(found).toContain('C:\\Program Files (x86)\\Microsoft\\Edge\\Application\\msedge.exe');
    expect(found).toContain('C:\\Users\\a\\AppData\\Local\\Google\\Chrome\\Application\\chrome.exe');
  });

  it('looks in /Applications and ~/Applications on macOS', () => {
    const found = installedCandidates({ platform: 'darwin', arch: 'arm64', env: { HOME: '/Users/a' } });
    expect(found).toContain('/Applications/Google Chrome.app/Contents/MacOS/Google Chrome');
    expect(found).toContain('/Users/a/Applications/Microsoft Edge.app/Contents/MacOS/Microsoft Edge');
  });

  it("looks at Debian's /usr/bin/chromium first on Linux, then the usual names on PATH", () => {
    const found = installedCandidates({ platform: 'linux', arch: 'x64', env: { PATH: '/opt/tools/bin' } });
    expect(found[0]).toBe('/usr/bin/chromium');
    expect(found).toContain('/opt/tools/bin/google-chrome');
  });

  it('takes MOORING_BROWSER before any installed browser', () => {
    // Any executable file stands for the browser here: the finder only chooses, it does not start it.
    const found = findInstalledBrowser({ ...THIS_MACHINE, env: { MOORING_BROWSER: process.execPath, PATH: process.env.PATH } });
    expect(found).toEqual({ executablePath: process.execPath, source: 'MOORING_BROWSER', env: {} });
  });

  it('refuses a MOORING_BROWSER that is not there, naming it, instead of falling back', async () => {
    await expect(findBrowser({ ...THIS_MACHINE, env: { MOORING_BROWSER: '/nowhere/chrome' } })).rejects.toThrow(/MOORING_BROWSER is \/nowhere\/chrome, which is not an executable file/);
  });

  it('fails loudly, saying what to install, where no browser is installed and the packaged one does not fit', async () => {
    // A Mac with nothing in /Applications: the packaged build is Linux x64 only, so nothing is left.
    const mac = { platform: 'darwin' as const, arch: 'arm64', env: { HOME: '/nowhere' } };
    await expect(findBrowser(mac)).rejects.toThrow(/No browser for the end-to-end tests: none of 6 usual install paths .* Linux x64 build only \(this is darwin arm64\)\. Install Chrome, Edge or Chromium, or set MOORING_BROWSER/);
  });

  it.runIf(linuxX64)('starts the Chromium packaged in the registry tarball when asked for it, and it renders text', async () => {
    const files = packagedBrowserFiles();
    expect(files, 'npm ci installs @sparticuz/chromium').not.toBeNull();
    const found = await findBrowser({ ...THIS_MACHINE, env: { MOORING_BROWSER: 'packaged' } });
    expect(found.source).toBe('packaged');
    const browser = await launchBrowser(found);
    try {
      // The package's major version follows the Chromium it carries.
      expect(browser.version().split('.')[0]).toBe(files!.version.split('.')[0]);
      const page = await browser.newPage();
      // Its language is a tag Intl accepts, whatever this machine's locale (C.UTF-8 on CI).
      expect(await page.evaluate(() => Intl.getCanonicalLocales(navigator.language)[0])).toMatch(/^[a-z]{2,3}(-[A-Za-z0-9]+)*$/);
      await page.setContent('<span id="a" style="font: 20px \'Open Sans\', monospace">Quennel spread</span><span id="b" style="font: 20px \'No Such Face\', monospace">Quennel spread</span>');
      const widths = await page.evaluate(() => ['a', 'b'].map((id) => document.getElementById(id)!.getBoundingClientRect().width));
      // Text has width, and the packaged Open Sans is found (it sets the text narrower than the monospace fallback).
      expect(widths[1]).toBeGreaterThan(0);
      expect(widths[0]).toBeLessThan(widths[1]);
    } finally {
      await browser.close();
    }
  });
});
