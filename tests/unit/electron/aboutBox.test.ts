import { describe, expect, it } from 'vitest';
import { aboutMessage } from '../../../electron/aboutBox.ts';

describe('aboutMessage', () => {
  it('names the app and version, the runtime versions, and carries the process-safety caution', () => {
    const box = aboutMessage('Passline', '0.1.0', { electron: '45.5.0', chrome: '142', node: '22.20.0' });
    expect(box.message).toBe('Passline 0.1.0');
    expect(box.detail).toContain('Electron 45.5.0 · Chromium 142 · Node 22.20.0');
    // The caution DESIGN.md asks for wherever results could be used for scale-up.
    expect(box.detail).toMatch(/not a process-safety assessment.*calorimetry/s);
  });
});
