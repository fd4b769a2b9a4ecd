import { describe, expect, it } from 'vitest';
import { commandFor } from '../../../../ui/state/shortcuts.ts';
import { formatDuration, formatScientific } from '../../../../ui/format/formatNumber.ts';

const key = (init: KeyboardEventInit, target?: HTMLElement) => {
  const event = new KeyboardEvent('keydown', init);
  if (target) Object.defineProperty(event, 'target', { value: target });
  return event;
};

describe('keyboard shortcuts', () => {
  it('Delete removes the selection only outside text fields; chords are the host command channel\'s', () => {
    expect(commandFor(key({ key: 'z', ctrlKey: true }))).toBeNull();
    expect(commandFor(key({ key: 'Delete' }, document.createElement('div')))).toBe('delete');
    expect(commandFor(key({ key: 'Backspace' }, document.createElement('div')))).toBe('delete');
    expect(commandFor(key({ key: 'Delete' }, document.createElement('input')))).toBeNull();
    expect(commandFor(key({ key: 'a' }))).toBeNull();
  });
});

describe('number formatting', () => {
  it('three significant figures, powers of ten outside 0.01–10⁴', () => {
    expect(formatScientific(0.0135881500479)).toBe('0.0136');
    expect(formatScientific(6.212437991620116e12)).toBe('6.21 × 10¹²');
    expect(formatScientific(-2.5e-7)).toBe('−2.50 × 10⁻⁷');
    expect(formatScientific(null)).toBe('—');
  });

  it('durations in the unit a person reads (1 d = 86 400 s, 1 yr = 365.25 d, Julian year, IAU)', () => {
    expect(formatDuration(51.0111514899)).toBe('51.0 s');
    expect(formatDuration(8066.41175461)).toBe('2.24 h');
    expect(formatDuration(235879.696519)).toBe('2.73 d');
    expect(formatDuration(365.25 * 86400 * 721)).toBe('721 yr');
  });
});
