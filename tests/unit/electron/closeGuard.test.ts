import { describe, expect, it, vi } from 'vitest';
import { CloseGuard, closeStepForChoice, closeStepForReply, type CloseChoice } from '../../../electron/closeGuard.ts';

/** A guard with recording dependencies, manual timers and scripted user answers. */
function setUp(choices: CloseChoice[] = []) {
  const timers: (() => void)[] = [];
  const deps = {
    askRenderer: vi.fn(),
    askUser: vi.fn(async (_name: string | null) => choices.shift() ?? 'cancel'),
    requestSave: vi.fn(),
    discard: vi.fn(async () => undefined),
    close: vi.fn(),
    timers: { set: (callback: () => void) => timers.push(callback), clear: vi.fn() },
  };
  const guard = new CloseGuard(deps);
  deps.close.mockImplementation(() => expect(guard.onClose()).toBe(true));
  return { guard, deps, fireTimeout: () => timers.at(-1)!() };
}

describe('close decisions', () => {
  it('closes a clean document at once and asks about a dirty or silent one', () => {
    expect(closeStepForReply({ dirty: false, name: 'a.passline' })).toBe('close');
    expect(closeStepForReply({ dirty: true, name: 'a.passline' })).toBe('ask');
    expect(closeStepForReply(null)).toBe('ask');
    expect([closeStepForChoice('save'), closeStepForChoice('discard'), closeStepForChoice('cancel')]).toEqual(['save', 'close', 'stay']);
  });
});

describe('CloseGuard', () => {
  it('holds the close, asks the renderer, and closes when the document is clean', async () => {
    const { guard, deps } = setUp();
    expect(guard.onClose()).toBe(false);
    expect(deps.askRenderer).toHaveBeenCalledTimes(1);
    await guard.onReply({ dirty: false, name: 'a.passline' });
    expect(deps.askUser).not.toHaveBeenCalled();
    expect(deps.close).toHaveBeenCalledTimes(1);
  });

  it('keeps the window when the user cancels, and asks again on the next close', async () => {
    const { guard, deps } = setUp(['cancel']);
    guard.onClose();
    await guard.onReply({ dirty: true, name: 'route.passline' });
    expect(deps.askUser).toHaveBeenCalledWith('route.passline');
    expect(deps.close).not.toHaveBeenCalled();
    expect(guard.onClose()).toBe(false);
    expect(deps.askRenderer).toHaveBeenCalledTimes(2);
  });

  it('discards: drops the working copy, then closes', async () => {
    const { guard, deps } = setUp(['discard']);
    guard.onClose();
    await guard.onReply({ dirty: true, name: 'route.passline' });
    expect(deps.discard).toHaveBeenCalled();
    expect(deps.close).toHaveBeenCalledTimes(1);
  });

  it('saves first: closes only once the renderer reports the document clean', async () => {
    const { guard, deps } = setUp(['save']);
    guard.onClose();
    await guard.onReply({ dirty: true, name: 'route.passline' });
    expect(deps.requestSave).toHaveBeenCalledTimes(1);
    expect(deps.close).not.toHaveBeenCalled();
    await guard.onReply({ dirty: false, name: 'route.passline' });
    expect(deps.close).toHaveBeenCalledTimes(1);
  });

  it('asks without a name when the renderer does not answer in time', async () => {
    const { guard, deps, fireTimeout } = setUp(['discard']);
    guard.onClose();
    fireTimeout();
    await vi.waitFor(() => expect(deps.close).toHaveBeenCalled());
    expect(deps.askUser).toHaveBeenCalledWith(null);
  });

  it('ignores replies nobody asked for and repeated close clicks while waiting', async () => {
    const { guard, deps } = setUp();
    await guard.onReply({ dirty: false, name: 'a.passline' });
    expect(deps.close).not.toHaveBeenCalled();
    guard.onClose();
    guard.onClose();
    expect(deps.askRenderer).toHaveBeenCalledTimes(1);
  });
});
