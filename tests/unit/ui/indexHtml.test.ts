import { describe, expect, it } from 'vitest';
import html from '../../../ui/index.html?raw';

/** The page's Content-Security-Policy as directive -> sources. */
function policy(): Map<string, string[]> {
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

  it('names no remote origin anywhere', () => {
    expect([...policy().values()].flat().filter((s) => /^(https?:|\*|'unsafe-)/.test(s))).toEqual([]);
  });
});
