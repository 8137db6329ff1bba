// A tiny static file server for the built site (node:http, 127.0.0.1 only), mounted under a base path
// like a team's intranet server would, so the tests also check that every link honours the base.
import { createReadStream, statSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { extname, join, normalize, resolve } from 'node:path';

const MIME: Record<string, string> = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript', '.css': 'text/css', '.json': 'application/json',
  '.svg': 'image/svg+xml', '.sqlite': 'application/vnd.sqlite3', '.png': 'image/png', '.txt': 'text/plain',
};

export interface StaticSite {
  origin: string; // http://127.0.0.1:port
  root: string; // origin + base path, ending with '/'
  close(): Promise<void>;
}

export async function serveStatic(dir: string, basePath = '/'): Promise<StaticSite> {
  const rootDir = resolve(dir);
  const base = basePath.endsWith('/') ? basePath : `${basePath}/`;
  const server: Server = createServer((request, response) => {
    const url = new URL(request.url ?? '/', 'http://127.0.0.1');
    const path = decodeURIComponent(url.pathname);
    if (!path.startsWith(base)) {
      response.writeHead(404).end('outside the base path');
      return;
    }
    let file = normalize(join(rootDir, path.slice(base.length)));
    if (!file.startsWith(rootDir)) {
      response.writeHead(403).end();
      return;
    }
    try {
      if (statSync(file).isDirectory()) file = join(file, 'index.html');
      statSync(file);
    } catch {
      response.writeHead(404).end('not found');
      return;
    }
    response.writeHead(200, { 'Content-Type': MIME[extname(file)] ?? 'application/octet-stream' });
    createReadStream(file).pipe(response);
  });
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  const address = server.address();
  if (address === null || typeof address === 'string') throw new Error('static server: no port');
  const origin = `http://127.0.0.1:${address.port}`;
  return {
    origin,
    root: `${origin}${base}`,
    close: () => new Promise<void>((done) => server.close(() => done())),
  };
}
