// A small static server of our own for the preview page: serves the built dist/ folder on
// 127.0.0.1 only, with "/" answering preview.html. No request leaves this machine.
//
//   node taskpane/preview/serve.mjs [port]      (default 3210; 0 picks a free port)
//
// startPreviewServer is also what the end-to-end tests use.

import { createServer } from 'node:http';
import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

const TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.png': 'image/png',
  '.svg': 'image/svg+xml',
  '.md': 'text/markdown; charset=utf-8',
  '.xml': 'application/xml; charset=utf-8',
};

/** The built dist/ folder beside the repository root. */
export const DIST = resolve(fileURLToPath(new URL('../../dist', import.meta.url)));

/** Starts the server; resolves with its URL and a close function. */
export function startPreviewServer({ root = DIST, port = 3210 } = {}) {
  const base = resolve(root);
  const server = createServer(async (request, response) => {
    try {
      const path = decodeURIComponent(new URL(request.url ?? '/', 'http://127.0.0.1').pathname);
      const relative = path === '/' ? 'preview.html' : normalize(path).replace(/^([/\\])+/, '');
      const file = resolve(join(base, relative));
      if (file !== base && !file.startsWith(base + sep)) throw Object.assign(new Error('outside'), { code: 'ENOENT' });
      if (!(await stat(file)).isFile()) throw Object.assign(new Error('not a file'), { code: 'ENOENT' });
      const body = await readFile(file);
      response.writeHead(200, { 'Content-Type': TYPES[extname(file)] ?? 'application/octet-stream', 'Cache-Control': 'no-store', 'X-Content-Type-Options': 'nosniff' });
      response.end(body);
    } catch {
      response.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8' });
      response.end('Not found');
    }
  });
  return new Promise((resolveStart, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const address = server.address();
      const url = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : port}/`;
      resolveStart({ url, close: () => new Promise((done) => server.close(() => done())) });
    });
  });
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const port = Number(process.argv[2] ?? process.env.PORT ?? 3210);
  startPreviewServer({ port }).then(({ url }) => {
    console.log(`Mooring pane preview on ${url} (the in-memory workbook with the demo data). Ctrl+C stops it.`);
  }, (error) => {
    console.error(`The preview server could not start: ${error.message}`);
    process.exit(1);
  });
}
