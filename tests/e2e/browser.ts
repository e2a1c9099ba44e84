/**
 * The end-to-end tests' browser: the one find-browser.ts finds (MOORING_BROWSER, else an
 * installed Chromium, Chrome or Edge, else the Chromium packaged in a registry dev dependency)
 * driven by playwright-core, headless, with no network but the preview server on 127.0.0.1
 * (no test tool downloads a browser of its own), and the built dist/ served by the preview's
 * own static server.
 */
import { existsSync, mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { findBrowser, type FoundBrowser } from './find-browser';
// @ts-expect-error The preview server is plain JavaScript (node taskpane/preview/serve.mjs).
import { startPreviewServer } from '../../taskpane/preview/serve.mjs';

/**
 * The switches every launch uses: no sandbox (the tests run as root on CI), no GPU, and none of
 * the browser's own background connections (this machine's network is closed to them).
 */
export const BROWSER_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--no-first-run'];

/** Launches a found browser headless with BROWSER_ARGS. */
export async function launchBrowser(found: FoundBrowser): Promise<Browser> {
  return chromium.launch({
    executablePath: found.executablePath,
    headless: true,
    args: BROWSER_ARGS,
    env: { ...process.env, ...found.env } as Record<string, string>,
  });
}

/** Screenshots of the walk go here (git-ignored). */
export const SHOTS = fileURLToPath(new URL('../../test-artifacts/e2e/', import.meta.url));

/** The built preview page. */
export const PREVIEW_HTML = fileURLToPath(new URL('../../dist/preview.html', import.meta.url));

/** A running preview with a page open at the pane's width, and what left the origin. */
export interface PreviewSession {
  url: string;
  browser: Browser;
  page: Page;
  /** Requests to anywhere but the preview server. */
  foreignRequests: string[];
  /** Console errors and page errors (content security policy refusals among them). */
  errors: string[];
  close(): Promise<void>;
}

/** Starts the server and the browser and opens the preview at 340 px wide. */
export async function openPreview(): Promise<PreviewSession> {
  if (!existsSync(PREVIEW_HTML)) throw new Error('dist/preview.html is missing: npm test builds it (or run npx webpack --mode production --config-name addin).');
  const found = await findBrowser();
  mkdirSync(SHOTS, { recursive: true });
  const server = (await startPreviewServer({ port: 0 })) as { url: string; close(): Promise<void> };
  const browser = await launchBrowser(found).catch(async (e: Error) => {
    await server.close();
    const hint = found.source === 'packaged' ? ' (the packaged Chromium needs the system library libnss3: on Debian or Ubuntu, apt-get install libnss3)' : '';
    throw new Error(`The ${found.source} browser ${found.executablePath} did not start${hint}: ${e.message}`);
  });
  console.info(`End-to-end browser: ${found.source} ${found.executablePath} (version ${browser.version()})`);
  const page = await browser.newPage({ viewport: { width: 340, height: 900 } });
  const foreignRequests: string[] = [];
  const errors: string[] = [];
  page.on('request', (r) => {
    if (!r.url().startsWith(server.url)) foreignRequests.push(r.url());
  });
  page.on('console', (m) => {
    if (m.type() === 'error' && !/favicon/.test(m.location().url)) errors.push(m.text());
  });
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(server.url);
  return {
    url: server.url,
    browser,
    page,
    foreignRequests,
    errors,
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/** Saves a full-page screenshot of the pane as test-artifacts/e2e/<name>.png. */
export async function shot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: `${SHOTS}${name}.png`, fullPage: true });
}
