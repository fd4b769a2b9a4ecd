import { describe, expect, it } from 'vitest';
import { createBrowserRecovery, type SnapshotStorage } from '../../../../ui/host/browserRecovery.ts';

function memoryStorage(): SnapshotStorage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return { data, getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v), removeItem: (k) => void data.delete(k) };
}

describe('browser working copy', () => {
  it('a copy left by an earlier page is offered with its time; this page\'s autosaves do not replace it', async () => {
    const storage = memoryStorage();
    const first = createBrowserRecovery(storage, () => new Date('2024-03-04T05:06:07.000Z'));
    await first.autosave({ name: 'route.passline', text: 'edits' });
    // The tab closed or crashed without a clean save; a new page starts.
    const second = createBrowserRecovery(storage, () => new Date('2024-03-05T00:00:00.000Z'));
    await second.autosave({ name: 'other.passline', text: 'new' });
    expect(await second.recoveryOffer()).toEqual({ name: 'route.passline', text: 'edits', savedAt: '2024-03-04T05:06:07.000Z' });
    await second.dismissRecovery();
    expect(await second.recoveryOffer()).toBeNull();
  });

  it('a clean document leaves nothing to offer, and no storage means no offer', async () => {
    const storage = memoryStorage();
    const first = createBrowserRecovery(storage);
    await first.autosave({ name: 'a.passline', text: 'x' });
    await first.autosave(null);
    expect(await createBrowserRecovery(storage).recoveryOffer()).toBeNull();
    expect(await createBrowserRecovery(null).recoveryOffer()).toBeNull();
  });

  it('ignores a damaged stored copy', async () => {
    const storage = memoryStorage();
    storage.setItem('passline:autosave', '{"name":1');
    expect(await createBrowserRecovery(storage).recoveryOffer()).toBeNull();
  });
});
