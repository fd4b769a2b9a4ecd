import { describe, expect, it, vi } from 'vitest';
import { createAutosaveScheduler, type Timers } from '../../../../ui/host/autosaveScheduler.ts';
import type { AutosaveSnapshot } from '../../../../ui/host/hostApi.ts';

/** Manual timers: `advance(ms)` runs what is due. */
function manualTimers() {
  let now = 0;
  let next = 1;
  const pending = new Map<number, { at: number; callback: () => void }>();
  const timers: Timers = {
    set: (callback, ms) => (pending.set(next, { at: now + ms, callback }), next++),
    clear: (handle) => void pending.delete(handle as number),
  };
  const advance = async (ms: number) => {
    now += ms;
    for (const [id, timer] of [...pending]) if (timer.at <= now) { pending.delete(id); timer.callback(); }
    await Promise.resolve();
    await Promise.resolve();
  };
  return { timers, advance, pending };
}

const snap = (text: string): AutosaveSnapshot => ({ name: 'a.passline', text });

describe('autosave scheduler', () => {
  it('writes the latest snapshot one interval after the first change, then at most once per interval', async () => {
    const { timers, advance } = manualTimers();
    const written: (AutosaveSnapshot | null)[] = [];
    const s = createAutosaveScheduler(async (x) => void written.push(x), () => undefined, 5000, timers);
    s.changed(() => snap('1'));
    await advance(2000);
    s.changed(() => snap('2'));
    await advance(2999);
    expect(written).toEqual([]);
    await advance(1);
    expect(written).toEqual([snap('2')]);
    await advance(20_000);
    expect(written).toHaveLength(1);
    s.changed(() => snap('3'));
    await advance(5000);
    expect(written).toEqual([snap('2'), snap('3')]);
  });

  it('asks for the snapshot only when it is due', async () => {
    const { timers, advance } = manualTimers();
    const take = vi.fn(() => snap('x'));
    const s = createAutosaveScheduler(async () => undefined, () => undefined, 5000, timers);
    for (let i = 0; i < 50; i++) s.changed(take);
    await advance(5000);
    expect(take).toHaveBeenCalledTimes(1);
  });

  it('clean() cancels the pending copy and clears the stored one', async () => {
    const { timers, advance, pending } = manualTimers();
    const written: (AutosaveSnapshot | null)[] = [];
    const s = createAutosaveScheduler(async (x) => void written.push(x), () => undefined, 5000, timers);
    s.changed(() => snap('1'));
    await s.clean();
    await advance(10_000);
    expect(written).toEqual([null]);
    expect(pending.size).toBe(0);
  });

  it('flush() writes at once; writes never overlap; failures are reported and later writes go on', async () => {
    const { timers } = manualTimers();
    let active = 0;
    let most = 0;
    const errors: unknown[] = [];
    const write = vi.fn(async (x: AutosaveSnapshot | null) => {
      active += 1;
      most = Math.max(most, active);
      await new Promise((resolve) => setTimeout(resolve, 5));
      active -= 1;
      if (x?.text === 'bad') throw new Error('disk full');
    });
    const s = createAutosaveScheduler(write, (e) => errors.push(e), 5000, timers);
    s.changed(() => snap('bad'));
    const first = s.flush();
    const second = s.clean();
    await Promise.all([first, second]);
    expect(write.mock.calls.map((c) => c[0])).toEqual([snap('bad'), null]);
    expect(most).toBe(1);
    expect(errors).toEqual([new Error('disk full')]);
  });
});
