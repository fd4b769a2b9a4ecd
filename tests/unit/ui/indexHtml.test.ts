import { describe, expect, it } from 'vitest';
import template from '../../../ui/index.html?raw';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

// Vite refuses to import .env files, so they are read from disk.
const uiFolder = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '..', 'ui');
const productionEnv = readFileSync(join(uiFolder, '.env.production'), 'utf8');
const developmentEnv = readFileSync(join(uiFolder, '.env.development'), 'utf8');

/** Values of a Vite env file (KEY="value" lines). */
function envValues(text: string): Record<string, string> {
  const pairs = text.split('\n').map((line) => /^(VITE_\w+)=(?:"(.*)"|(.*))$/.exec(line.trim())).filter((m) => m !== null);
  return Object.fromEntries(pairs.map((m) => [m[1], m[2] ?? m[3] ?? '']));
}

/** index.html as Vite writes it for a mode: %VITE_X% replaced from that mode's env file. */
function htmlFor(env: string): string {
  const values = envValues(env);
  return template.replace(/%(VITE_\w+)%/g, (_, key: string) => {
    if (!(key in values)) throw new Error(`index.html uses ${key}, which the env file does not define`);
    return values[key]!;
  });
}

/** The page's Content-Security-Policy as directive -> sources. */
function policy(html = htmlFor(productionEnv)): Map<string, string[]> {
  const page = new DOMParser().parseFromString(html, 'text/html');
  const content = page.querySelector('meta[http-equiv="Content-Security-Policy"]')?.getAttribute('content') ?? '';
  return new Map(content.split(';').map((d) => d.trim().split(/\s+/)).filter((d) => d[0]).map(([name, ...sources]) => [name!, sources]));
}

// Directives follow the W3C Content Security Policy Level 3 recommendation; the choice
// of a self-only policy for a desktop renderer is common practice for Electron apps.
describe('ui/index.html Content-Security-Policy', () => {
  it('allows scripts and styles only from the app itself', () => {
    const csp = policy();
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('script-src')).toEqual(["'self'"]);
    expect(csp.get('style-src')).toEqual(["'self'"]);
  });

  it('forbids plugins, base rewriting and form posts, and loads images only locally', () => {
    const csp = policy();
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('base-uri')).toEqual(["'none'"]);
    expect(csp.get('form-action')).toEqual(["'none'"]);
    expect(csp.get('img-src')).toEqual(["'self'", 'data:', 'blob:']);
  });

  it('names no remote origin and nothing unsafe in the built app', () => {
    expect([...policy().values()].flat().filter((s) => /^(https?:|\*|'unsafe-)/.test(s))).toEqual([]);
  });

  it('relaxes only style-src, only on the dev server (which injects inline <style> elements)', () => {
    const dev = policy(htmlFor(developmentEnv));
    const built = policy();
    expect(dev.get('style-src')).toEqual(["'self'", "'unsafe-inline'"]);
    expect(new Map([...dev].filter(([name]) => name !== 'style-src'))).toEqual(new Map([...built].filter(([name]) => name !== 'style-src')));
  });
});
