/**
 * Serves the exported web app (dist/): the precompressed twin of a file when
 * the browser accepts it (brotli first, then gzip; see server/tools/web-pwa.ts),
 * with the original's Content-Type, `Content-Encoding` and
 * `Vary: Accept-Encoding`; hashed build files cached for a year as
 * `immutable`; index.html, the service worker, the manifest and the icons
 * always revalidated (`no-cache`, with an ETag). Every other GET outside
 * /api gets index.html (a single-page app: the router takes it from there),
 * except a missing build file, which is a plain 404 so a stale page never
 * runs HTML as a script.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { NextFunction, Request, Response } from 'express';

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.webmanifest': 'application/manifest+json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.ttf': 'font/ttf',
  '.otf': 'font/otf',
  '.woff2': 'font/woff2',
  '.txt': 'text/plain; charset=utf-8',
};

/** A file name carrying Expo's 32-hex content hash never changes: cache it for a year. */
export const HASHED = /[.-][0-9a-f]{32}(@\dx)?\.\w+$/;
export const IMMUTABLE = 'public, max-age=31536000, immutable';
export const REVALIDATE = 'no-cache';

/** The encodings the request accepts, best first: br, then gzip (q=0 refuses one). */
export function acceptedEncodings(header: string | undefined): ('br' | 'gzip')[] {
  const accepted = new Map<string, number>();
  for (const part of (header ?? '').split(',')) {
    const [name, ...params] = part.trim().toLowerCase().split(';');
    if (!name) continue;
    const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
    accepted.set(name, q ? Number(q.slice(2)) : 1);
  }
  const ok = (name: string) => (accepted.get(name) ?? accepted.get('*') ?? 0) > 0;
  return (['br', 'gzip'] as const).filter(ok);
}

function isFile(file: string): boolean {
  try {
    return fs.statSync(file).isFile();
  } catch {
    return false;
  }
}

function send(req: Request, res: Response, next: NextFunction, file: string, cacheControl: string): void {
  const type = TYPES[path.extname(file).toLowerCase()] ?? 'application/octet-stream';
  res.setHeader('Content-Type', type);
  res.setHeader('Cache-Control', cacheControl);
  res.setHeader('Vary', 'Accept-Encoding');
  let chosen = file;
  for (const encoding of acceptedEncodings(req.get('accept-encoding'))) {
    const twin = `${file}.${encoding === 'br' ? 'br' : 'gz'}`;
    if (isFile(twin)) {
      res.setHeader('Content-Encoding', encoding);
      chosen = twin;
      break;
    }
  }
  // `send` keeps the Content-Type set above; the ETag is the sent file's own.
  res.sendFile(chosen, { cacheControl: false, dotfiles: 'deny' }, (err) => {
    if (err && !res.headersSent) next(err);
  });
}

export function webStatic(webDir: string) {
  const root = path.resolve(webDir);
  const indexHtml = path.join(root, 'index.html');
  return (req: Request, res: Response, next: NextFunction) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    let relative: string;
    try {
      relative = decodeURIComponent(req.path);
    } catch {
      return next();
    }
    const file = path.join(root, path.normalize(relative));
    const inside = file.startsWith(root + path.sep);
    const hidden = relative.split('/').some((part) => part.startsWith('.'));
    if (inside && !hidden && !/\.(br|gz)$/.test(file) && isFile(file)) {
      return send(req, res, next, file, HASHED.test(file) ? IMMUTABLE : REVALIDATE);
    }
    // A build file that is not here (an old page asking for a chunk of a previous build).
    if (/^\/(_expo|assets)\//.test(relative) || /\.(js|css|map|ttf|woff2|png)$/.test(relative)) return next();
    if (!isFile(indexHtml)) return next();
    return send(req, res, next, indexHtml, REVALIDATE);
  };
}
