import { readFile, realpath } from 'node:fs/promises';
import { extname, resolve, sep } from 'node:path';

/** The renderer's own scheme: its pages are `passline-app://app/…`, never `file://`. */
export const APP_SCHEME = 'passline-app';
/** The app page every window loads (and the only page whose IPC is trusted). */
export const APP_INDEX_URL = `${APP_SCHEME}://app/index.html`;

/**
 * Privileges of the scheme, registered before the app is ready: a standard, secure origin,
 * so `script-src 'self'` means the app's own folder and nothing else on disk.
 */
export const APP_SCHEME_PRIVILEGES = { scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true } };

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.css': 'text/css; charset=utf-8',
  '.json': 'application/json', '.svg': 'image/svg+xml', '.png': 'image/png', '.ttf': 'font/ttf', '.woff2': 'font/woff2',
  '.wasm': 'application/wasm', '.ico': 'image/x-icon', '.map': 'application/json',
};

const inside = (root: string, path: string) => path === root || path.startsWith(root + sep);

/** The file inside `root` that an app URL names, or null for any other URL or a path that leaves `root`. */
export function appFilePath(root: string, url: string): string | null {
  let parsed: URL;
  try { parsed = new URL(url); } catch { return null; }
  if (parsed.protocol !== `${APP_SCHEME}:` || parsed.host !== 'app') return null;
  let relative: string;
  try { relative = decodeURIComponent(parsed.pathname); } catch { return null; }
  if (relative.includes('\u0000')) return null;
  const path = resolve(root, `.${relative}`);
  return inside(resolve(root), path) ? path : null;
}

/**
 * Answers a request on the app scheme from the renderer folder `root`: the file, with its
 * type, or 404 for anything outside the folder (also through a symbolic link) or missing.
 */
export async function serveAppFile(root: string, url: string): Promise<Response> {
  const notFound = () => new Response('not found', { status: 404, headers: { 'content-type': 'text/plain' } });
  const path = appFilePath(root, url);
  if (!path) return notFound();
  try {
    const real = await realpath(path);
    if (!inside(await realpath(root), real)) return notFound();
    const body = await readFile(real);
    return new Response(body, { status: 200, headers: { 'content-type': TYPES[extname(real).toLowerCase()] ?? 'application/octet-stream' } });
  } catch {
    return notFound();
  }
}
