import { describe, expect, it } from 'vitest';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';
import { serializeDocument } from '../../../core/model/load.ts';
import { loadStructureToolkit } from '../../../core/structure/loadStructureToolkit.ts';
import { structuresDocument } from '../../fixtures/structuresDocument.ts';

// The first load of the toolkit takes seconds on a busy machine; the commands reuse it.
await loadStructureToolkit();

async function run(argv: string[], text: string) {
  let out = '', err = '';
  const outputs = new Map<string, string | Uint8Array>();
  const io: CliIo = {
    out: (t) => { out += t; }, err: (t) => { err += t; },
    readFile: () => text, readBytes: () => new Uint8Array(),
    writeFile: (path, data) => { outputs.set(path, data); },
  };
  return { code: await main(argv, io), out, err, outputs };
}

describe('passline with structures', () => {
  it('render draws each point’s structure as in the app (a named SVG group per point)', async () => {
    const { code, err, outputs } = await run(['render', 'ester.passline', '-o', 'fig.svg', '--preset', 'single'], serializeDocument(structuresDocument()));
    expect(err).toBe('');
    expect(code).toBe(0);
    const svg = String(outputs.get('fig.svg'));
    for (const point of ['r', 'ts1', 'int', 'ts2', 'p1', 'p2']) expect(svg).toContain(`<g id="structure-a-${point}"`);
  }, 30_000);

  it('analyze takes formulas from the structures and reports a typed formula that disagrees', async () => {
    const doc = structuresDocument();
    doc.species[0]!.formula = 'C3H6O';
    const { code, out } = await run(['analyze', 'ester.passline', '--json'], serializeDocument(doc));
    expect(code).toBe(0);
    const findings = (JSON.parse(out) as { checks: { code: string; message: string }[] }).checks;
    expect(findings.find((f) => f.code === 'structure-formula-mismatch')?.message).toMatch(/^species "methyl acetate": the typed formula C3H6O has 1 fewer O than the structure \(C3H6O2\)/);
    expect(findings.some((f) => f.code === 'mass-imbalance')).toBe(false);
  });
});
