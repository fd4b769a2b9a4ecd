import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { sceneToSvg } from '../../../core/export/sceneToSvg.ts';
import { fontMetrics } from '../figure/fontFixture.ts';
import { fixture, twoPathways } from '../figure/profileFixture.ts';

const metrics = fontMetrics();
// jsdom ships no type declarations here; only its DOMParser is used.
const { JSDOM } = createRequire(import.meta.url)('jsdom') as { JSDOM: new (html: string) => { window: { DOMParser: typeof DOMParser } } };
const { window } = new JSDOM('');

/** Parses with jsdom's strict XML parser; throws on a parse error. */
function parseSvg(svg: string): Document {
  const xml = new window.DOMParser().parseFromString(svg, 'image/svg+xml');
  const error = xml.getElementsByTagName('parsererror')[0];
  if (error) throw new Error(`not well-formed XML: ${error.textContent}`);
  return xml;
}

describe('sceneToSvg', () => {
  it('writes well-formed SVG sized in mm with a matching viewBox and a named font', () => {
    const { doc, profile } = twoPathways({ preset: 'single' });
    const xml = parseSvg(sceneToSvg(layoutFigure(profile, doc, { metrics })));
    const root = xml.documentElement;
    expect(root.namespaceURI).toBe('http://www.w3.org/2000/svg');
    expect(root.getAttribute('width')).toBe('85mm');
    const [, , w, h] = root.getAttribute('viewBox')!.split(' ').map(Number);
    expect(w).toBe(85);
    expect(`${h}mm`).toBe(root.getAttribute('height'));
    expect(root.getAttribute('font-family')).toMatch(/^DejaVu Sans/);
  });

  it('keeps text as text elements', () => {
    const { doc, profile } = twoPathways();
    const xml = parseSvg(sceneToSvg(layoutFigure(profile, doc, { metrics })));
    const all = [...xml.getElementsByTagName('text')].map((t) => t.textContent);
    expect(all).toContain('ΔG / kcal mol⁻¹');
    expect(all).toContain('TS1‡');
    expect(all).toContain('Reaction coordinate');
  });

  it('keeps hostile labels inert and intact', () => {
    const hostile = `<script>alert("x")</script> & 'q' ]]>`;
    const { doc, profile } = fixture([
      { id: 'a', name: '<b onload="x()">A&B</b>', points: [[hostile, 'min', 0], ['B', 'min', -1]] },
      { id: 'b', name: 'other', points: [['C', 'min', 1]] },
    ]);
    const svg = sceneToSvg(layoutFigure(profile, doc, { metrics }));
    const xml = parseSvg(svg);
    expect(xml.getElementsByTagName('script')).toHaveLength(0);
    expect(xml.getElementsByTagName('b')).toHaveLength(0);
    const all = [...xml.getElementsByTagName('text')].map((t) => t.textContent);
    expect(all).toContain(hostile);
    expect(all).toContain('<b onload="x()">A&B</b>');
  });

  it('keeps hostile free-text annotations inert and intact', () => {
    const hostile = `<img src=x onerror="alert(1)"> & "q" ]]>`;
    const { doc, profile } = fixture([{ id: 'a', name: 'A', points: [['R', 'min', 0], ['T', 'ts', 12], ['P', 'min', -3]] }],
      { annotations: [{ type: 'text', text: hostile, x: 1, y: 6 }] });
    const xml = parseSvg(sceneToSvg(layoutFigure(profile, doc, { metrics })));
    expect(xml.getElementsByTagName('img')).toHaveLength(0);
    expect([...xml.getElementsByTagName('text')].map((t) => t.textContent)).toContain(hostile);
  });

  it('embeds the font as a data URL when asked', () => {
    const { doc, profile } = twoPathways();
    const bytes = new Uint8Array([0, 1, 0, 0, 255, 254]);
    const svg = sceneToSvg(layoutFigure(profile, doc, { metrics }), { embedFont: bytes });
    const style = parseSvg(svg).getElementsByTagName('style')[0]!.textContent!;
    // Base64 of 00 01 00 00 FF FE (RFC 4648 §4) worked by hand: AAEAAP/+
    expect(style).toContain("src:url(data:font/ttf;base64,AAEAAP/+) format('truetype')");
  });

  it('groups the drawing by layer, and each layer by pathway, with readable ids (issue 11)', () => {
    const { doc, profile } = twoPathways({ preset: 'single' });
    const xml = parseSvg(sceneToSvg(layoutFigure(profile, doc, { metrics })));
    const top = [...xml.documentElement.children].filter((e) => e.tagName === 'g').map((g) => g.getAttribute('id'));
    expect(top).toEqual(['axis', 'connectors', 'levels', 'labels', 'legend']);
    const group = (id: string) => xml.getElementById(id)!;
    // A whole pathway's pieces share one class; each layer holds one group per pathway.
    for (const layer of ['connectors', 'levels', 'labels', 'legend']) {
      expect([...group(layer).children].map((g) => g.getAttribute('id'))).toEqual([`${layer}-cat`, `${layer}-un`]);
    }
    expect(xml.getElementsByClassName('pathway-cat').length).toBe(4);
    // Every bar of a pathway sits in its levels group, every label line in its labels group, as text.
    expect(group('levels-cat').getElementsByTagName('path').length).toBe(5);
    expect([...group('labels-cat').getElementsByTagName('text')].map((t) => t.textContent)).toContain('TS1‡');
    expect([...group('axis').getElementsByTagName('text')].map((t) => t.textContent)).toContain('Reaction coordinate');
    expect(group('levels').getElementsByTagName('text').length).toBe(0);
  });

  it('makes ids from any pathway id, unique and XML-safe', () => {
    const { doc, profile } = fixture([
      { id: '1 route/a', name: 'A', points: [['R', 'min', 0], ['T', 'ts', 12], ['P', 'min', -3]] },
      { id: '1 route?a', name: 'B', points: [['R', 'min', 0], ['T2', 'ts', 9], ['P', 'min', -3]] },
    ]);
    const xml = parseSvg(sceneToSvg(layoutFigure(profile, doc, { metrics })));
    const ids = [...xml.getElementsByTagName('g')].map((g) => g.getAttribute('id')!);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(id).toMatch(/^[A-Za-z_][A-Za-z0-9._-]*$/);
    expect(ids).toContain('levels-_1_route_a');
    expect(ids).toContain('levels-_1_route_a-2');
  });
});
