/**
 * A small static file server for the built app (dist/), used by the browser tests and by
 * `npm run bench:ui`. `serveDir(root, port = 0)` → { url, close() }; port 0 takes any free
 * port on 127.0.0.1. Only GET and HEAD; paths are confined to `root`; `/` serves index.html.
 */
import { createServer } from 'node:http';
import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize, resolve, sep } from 'node:path';
import type { AddressInfo } from 'node:net';

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.wasm': 'application/wasm',
  '.txt': 'text/plain; charset=utf-8',
};

export interface Served {
  url: string;
  close(): Promise<void>;
}

export async function serveDir(root: string, port = 0): Promise<Served> {
  const base = resolve(root);
  const index = join(base, 'index.html');
  await stat(index).catch(() => {
    throw new Error(`${index} is missing: build the app first (npx vite build)`);
  });
  const server = createServer((req, res) => {
    void (async () => {
      if (req.method !== 'GET' && req.method !== 'HEAD') {
        res.writeHead(405).end();
        return;
      }
      const path = decodeURIComponent(new URL(req.url ?? '/', 'http://x').pathname);
      const file = normalize(join(base, path.endsWith('/') ? `${path}index.html` : path));
      if (file !== base && !file.startsWith(base + sep)) {
        res.writeHead(403).end();
        return;
      }
      try {
        const body = await readFile(file);
        res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream', 'cache-control': 'no-store' });
        res.end(req.method === 'HEAD' ? undefined : body);
      } catch {
        res.writeHead(404, { 'content-type': 'text/plain' }).end('not found');
      }
    })();
  });
  await new Promise<void>((ok, no) => {
    server.once('error', no);
    server.listen(port, '127.0.0.1', () => ok());
  });
  const { port: actual } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${actual}/`,
    close: () => new Promise((ok) => server.close(() => ok())),
  };
}
