import { describe, expect, it } from 'vitest';
import { userMessage } from '../../../../ui/state/userMessage.ts';

describe('userMessage', () => {
  it('strips the wrapper Electron puts around errors from the main process', () => {
    expect(userMessage(new Error("Error invoking remote method 'passline:save-document': Error: could not write a.passline (EACCES)"))).toBe('could not write a.passline (EACCES)');
  });
  it('keeps other messages as they are', () => {
    expect(userMessage(new Error('a.passline is too large to open'))).toBe('a.passline is too large to open');
    expect(userMessage('plain text')).toBe('plain text');
  });
});
