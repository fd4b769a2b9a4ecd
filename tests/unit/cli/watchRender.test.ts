import { describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startPassline } from './cliBin.ts';

// End-to-end: `passline render --watch` as a real process, edited the ways editors save.
const table = (ts: string) => `pathway,label,kind,G [kcal/mol]\nA,R,min,0\nA,TS,ts,${ts}\nA,P,min,-5\n`;

async function until(what: string, test: () => boolean, ms = 30_000): Promise<void> {
  const end = Date.now() + ms;
  while (!test()) {
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
const wrote = (stderr: string) => stderr.split('\n').filter((l) => / wrote fig\.svg$/.test(l)).length;

describe('passline render --watch', { timeout: 90_000 }, () => {
  it('renders again on each change (in place or by rename), survives a bad save, and ends cleanly on Ctrl+C', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'passline-watch-'));
    const doc = join(dir, 'route.csv');
    writeFileSync(doc, table('12.0'));
    const run = startPassline(['render', 'route.csv', '-o', 'fig.svg', '--watch'], dir);
    const figure = () => { try { return readFileSync(join(dir, 'fig.svg'), 'utf8'); } catch { return ''; } };
    try {
      await until('the first render', () => run.stderr().includes('watching route.csv (Ctrl+C to stop)'));
      expect(figure()).toContain('+12.0');

      writeFileSync(doc, table('17.5')); // saved in place
      await until('the re-render after an in-place save', () => figure().includes('+17.5'));

      writeFileSync(join(dir, 'route.csv.tmp'), table('9.5')); // saved by rename, as many editors do
      renameSync(join(dir, 'route.csv.tmp'), doc);
      await until('the re-render after a rename', () => figure().includes('+9.5'));

      writeFileSync(doc, 'pathway,label,kind,G [kcal/mol]\nA,R,min,oops\n');
      await until('the report of the bad save', () => run.stderr().includes('route.csv: line 2, column "G [kcal/mol]" ("oops"): expected a number'));
      expect(figure()).toContain('+9.5'); // the last good figure stays
      expect(run.child.exitCode).toBeNull();

      writeFileSync(doc, table('4.0'));
      await until('the re-render after the fix', () => figure().includes('+4.0'));

      // A burst of saves within the debounce time is drawn once, from the last save (fewer
      // renders than saves, rather than exactly one: a loaded machine may pause this process
      // between two saves for longer than the debounce time).
      const before = wrote(run.stderr());
      for (const ts of ['5.0', '6.0', '7.0', '8.0']) writeFileSync(doc, table(ts));
      await until('the render after the burst', () => figure().includes('+8.0'));
      await new Promise((r) => setTimeout(r, 600));
      expect(wrote(run.stderr()) - before).toBeGreaterThanOrEqual(1);
      expect(wrote(run.stderr()) - before).toBeLessThan(4);
    } catch (error) {
      throw new Error(`${(error as Error).message}\n--- passline's stderr:\n${run.stderr()}`);
    } finally {
      run.child.kill('SIGINT');
    }
    expect(await run.exited).toBe(0);
    expect(run.stderr()).toMatch(/stopped watching\n$/);
    expect(readdirSync(dir).sort()).toEqual(['fig.svg', 'route.csv']); // no temporary files left
  });
});
