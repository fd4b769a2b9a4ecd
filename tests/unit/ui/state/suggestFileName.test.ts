import { describe, expect, it } from 'vitest';
import { suggestFileName } from '../../../../ui/state/suggestFileName.ts';

describe('suggestFileName', () => {
  it('keeps a name that already has the extension', () => {
    expect(suggestFileName('Route B.passline', 'x', '.passline')).toBe('Route B.passline');
  });
  it('replaces another extension and makes a safe stem', () => {
    expect(suggestFileName('profile.json', '', '.passline')).toBe('profile.passline');
  });
  it('falls back to the title, then to "untitled"', () => {
    expect(suggestFileName('', 'Amide coupling: route/2', '.passline')).toBe('amide-coupling-route2.passline');
    expect(suggestFileName('', '‡‡', '.passline')).toBe('untitled.passline');
  });
});
