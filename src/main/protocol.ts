/**
 * The app's own page scheme, `coppice-app://app/…`, serving the built renderer. Registered as
 * privileged (standard, secure, fetch, streams) so module workers and query strings work,
 * which they do not on file://. Every response carries the Content Security Policy.
 */
import { readFile, realpath as fsRealpath } from 'node:fs/promises';
import { extname, join, normalize, sep } from 'node:path';
import { APP_SCHEME } from '../core/project/ipc-contract.ts';

export const APP_HOST = 'app';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;

export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self' blob:",
  "style-src 'self' 'unsafe-inline'",
  "font-src 'self' data:",
  "img-src 'self' data: blob:",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-ancestors 'none'",
].join('; ');

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.woff': 'font/woff',
  '.woff2': 'font/woff2',
  '.ttf': 'font/ttf',
};

/** The parts of Electron's `protocol` we use. */
export interface ProtocolLike {
  registerSchemesAsPrivileged(schemes: { scheme: string; privileges: Record<string, boolean> }[]): void;
  handle(scheme: string, handler: (req: Request) => Response | Promise<Response>): void;
}

/** Must run before the app is ready. */
export function registerAppScheme(protocol: Pick<ProtocolLike, 'registerSchemesAsPrivileged'>): void {
  protocol.registerSchemesAsPrivileged([
    { scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true, stream: true, codeCache: true } },
  ]);
}

/** The file under `root` a request URL names, or null for another host or a path escaping root. */
export function resolveAppPath(root: string, url: string): string | null {
  let u: URL;
  try {
    u = new URL(url);
  } catch {
    return null;
  }
  if (u.protocol !== `${APP_SCHEME}:` || u.host !== APP_HOST) return null;
  let rel: string;
  try {
    rel = decodeURIComponent(u.pathname);
  } catch {
    return null;
  }
  // NUL, and backslashes (a path separator on Windows, where `..\` would escape normalization checks).
  if (rel.includes('\0') || rel.includes('\\')) return null;
  if (rel === '/' || rel === '') rel = '/index.html';
  const full = normalize(join(root, rel));
  const base = normalize(root.endsWith(sep) ? root : root + sep);
  return full.startsWith(base) ? full : null;
}

/** Whether `path` lies inside the folder `root` (both already resolved). */
function inside(root: string, path: string): boolean {
  const base = root.endsWith(sep) ? root : root + sep;
  return path.startsWith(base);
}

/**
 * Serves the renderer folder. The path a URL names must lie inside `root`, and so must the
 * file it really is: symbolic links are resolved (`realpath`) and a link out of the folder
 * is refused like any other path outside it.
 */
export function serveApp(
  protocol: Pick<ProtocolLike, 'handle'>,
  root: string,
  read: (p: string) => Promise<Buffer> = readFile,
  realpath: (p: string) => Promise<string> = fsRealpath,
): void {
  const realRoot = realpath(root).catch(() => null);
  protocol.handle(APP_SCHEME, async (req) => {
    const path = resolveAppPath(root, req.url);
    if (!path) return new Response('not found', { status: 404 });
    try {
      const [rootReal, fileReal] = await Promise.all([realRoot, realpath(path)]);
      if (!rootReal || !inside(rootReal, fileReal)) return new Response('not found', { status: 404 });
      const body = await read(fileReal);
      return new Response(new Uint8Array(body), {
        headers: { 'content-type': TYPES[extname(path)] ?? 'application/octet-stream', 'content-security-policy': CONTENT_SECURITY_POLICY, 'x-content-type-options': 'nosniff' },
      });
    } catch {
      return new Response('not found', { status: 404 });
    }
  });
}
