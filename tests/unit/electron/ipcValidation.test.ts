import { describe, expect, it } from 'vitest';
import { argumentCheckers, checkAutosaveArgs, checkCloseReplyArgs, checkExportArgs, checkNoArgs, checkPathArgs, checkSaveArgs, IPC_LIMITS } from '../../../electron/ipcValidation.ts';
import { hostChannels } from '../../../ui/host/hostApi.ts';

const absolute = process.platform === 'win32' ? 'C:\\docs\\a.passline' : '/home/u/a.passline';
const reason = (checked: { ok: boolean; reason?: string }) => (checked.ok ? 'ok' : checked.reason);

describe('checkSaveArgs', () => {
  it('accepts a well-formed request, with or without a path', () => {
    expect(checkSaveArgs([{ suggestedName: 'a.passline', text: '{}' }])).toEqual({ ok: true, value: [{ suggestedName: 'a.passline', text: '{}' }] });
    expect(checkSaveArgs([{ suggestedName: 'a.passline', text: '{}', path: absolute }]).ok).toBe(true);
  });

  it('refuses wrong shapes and extra fields', () => {
    expect(reason(checkSaveArgs([]))).toBe('expected one request object');
    expect(reason(checkSaveArgs(['a.passline']))).toBe('expected one request object');
    expect(reason(checkSaveArgs([{ suggestedName: 'a.passline', text: '{}' }, 2]))).toBe('expected one request object');
    expect(reason(checkSaveArgs([{ suggestedName: 'a.passline', text: '{}', mode: 0o777 }]))).toBe('unexpected field mode');
    expect(reason(checkSaveArgs([{ suggestedName: 'a.passline', text: 5 }]))).toBe('text: expected a string');
  });

  it('refuses names with folders, control characters, the wrong extension or too many characters', () => {
    expect(reason(checkSaveArgs([{ suggestedName: '../a.passline', text: '' }]))).toMatch(/without folders/);
    expect(reason(checkSaveArgs([{ suggestedName: 'a\u0000.passline', text: '' }]))).toMatch(/without folders/);
    expect(reason(checkSaveArgs([{ suggestedName: 'a.exe', text: '' }]))).toBe('suggestedName: expected a name ending in .passline');
    expect(reason(checkSaveArgs([{ suggestedName: `${'a'.repeat(IPC_LIMITS.nameChars)}.passline`, text: '' }]))).toMatch(/1 to 255 characters/);
  });

  it('refuses relative paths, other extensions and over-long text', () => {
    expect(reason(checkSaveArgs([{ suggestedName: 'a.passline', text: '', path: 'a.passline' }]))).toBe('path: expected an absolute path');
    expect(reason(checkSaveArgs([{ suggestedName: 'a.passline', text: '', path: absolute.replace('.passline', '.bashrc') }]))).toBe('path: expected a .passline file');
    expect(reason(checkSaveArgs([{ suggestedName: 'a.passline', text: 'x'.repeat(IPC_LIMITS.textChars + 1) }]))).toMatch(/^text: longer than/);
  });
});

describe('checkExportArgs', () => {
  it('accepts text and bytes whose name matches the type', () => {
    expect(checkExportArgs([{ suggestedName: 'f.svg', data: '<svg/>', mimeType: 'image/svg+xml' }]).ok).toBe(true);
    expect(checkExportArgs([{ suggestedName: 'f.PDF', data: new Uint8Array(4), mimeType: 'application/pdf' }]).ok).toBe(true);
  });

  it('refuses unknown types, mismatched names and other data', () => {
    expect(reason(checkExportArgs([{ suggestedName: 'f.html', data: '', mimeType: 'text/html' }]))).toBe('mimeType: expected one of the export types');
    expect(reason(checkExportArgs([{ suggestedName: 'f.svg', data: '', mimeType: 'toString' }]))).toBe('mimeType: expected one of the export types');
    expect(reason(checkExportArgs([{ suggestedName: 'f.sh', data: '', mimeType: 'image/png' }]))).toBe('suggestedName: expected a name ending in .png');
    expect(reason(checkExportArgs([{ suggestedName: 'f.png', data: [1, 2], mimeType: 'image/png' }]))).toBe('data: expected a string or bytes');
  });
});

describe('checkNoArgs', () => {
  it('accepts nothing but no arguments', () => {
    expect(checkNoArgs([]).ok).toBe(true);
    expect(reason(checkNoArgs(['/etc/passwd']))).toBe('expected no arguments');
  });
});

describe('checkPathArgs (open a known or dropped file)', () => {
  it('accepts one absolute .passline path', () => {
    expect(checkPathArgs([absolute])).toEqual({ ok: true, value: [absolute] });
  });

  it('refuses missing, extra, relative, empty, foreign and over-long paths', () => {
    expect(reason(checkPathArgs([]))).toBe('expected one path');
    expect(reason(checkPathArgs([absolute, absolute]))).toBe('expected one path');
    expect(reason(checkPathArgs(['']))).toBe('path: expected an absolute path');
    expect(reason(checkPathArgs([{ path: absolute }]))).toBe('path: expected a string');
    expect(reason(checkPathArgs([absolute.replace('.passline', '.exe')]))).toBe('path: expected a .passline file');
    expect(reason(checkPathArgs([`${absolute.slice(0, 3)}${'d/'.repeat(IPC_LIMITS.pathChars)}a.passline`]))).toBe('path: expected an absolute path');
  });
});

describe('checkAutosaveArgs', () => {
  it('accepts a snapshot, with or without its path, and null', () => {
    expect(checkAutosaveArgs([{ name: 'untitled.passline', text: '{}' }]).ok).toBe(true);
    expect(checkAutosaveArgs([{ name: 'a.passline', text: '{}', path: absolute }]).ok).toBe(true);
    expect(checkAutosaveArgs([null])).toEqual({ ok: true, value: [null] });
  });

  it('refuses other shapes, names and sizes', () => {
    expect(reason(checkAutosaveArgs([]))).toBe('expected one snapshot or null');
    expect(reason(checkAutosaveArgs(['text']))).toBe('expected one snapshot or null');
    expect(reason(checkAutosaveArgs([{ name: 'a.passline', text: '', savedAt: 'now' }]))).toBe('unexpected field savedAt');
    expect(reason(checkAutosaveArgs([{ name: '../a.passline', text: '' }]))).toMatch(/^name: expected a file name without folders/);
    expect(reason(checkAutosaveArgs([{ name: 'a.passline', text: 'x'.repeat(IPC_LIMITS.textChars + 1) }]))).toMatch(/^text: longer than/);
    expect(reason(checkAutosaveArgs([{ name: 'a.passline', text: '', path: 'rel.passline' }]))).toBe('path: expected an absolute path');
  });
});

describe('checkCloseReplyArgs', () => {
  it('accepts a dirty flag and a name', () => {
    expect(checkCloseReplyArgs([{ dirty: true, name: 'route.passline' }])).toEqual({ ok: true, value: [{ dirty: true, name: 'route.passline' }] });
  });

  it('refuses a dirty flag that is not a boolean, odd names and extra fields', () => {
    expect(reason(checkCloseReplyArgs([{ dirty: 'yes', name: 'a' }]))).toBe('dirty: expected true or false');
    expect(reason(checkCloseReplyArgs([{ dirty: false, name: 'a\nb' }]))).toMatch(/^name: expected up to 255 characters/);
    expect(reason(checkCloseReplyArgs([{ dirty: false, name: 'a'.repeat(300) }]))).toMatch(/^name:/);
    expect(reason(checkCloseReplyArgs([{ dirty: false, name: 'a', close: true }]))).toBe('unexpected field close');
  });
});

describe('argumentCheckers', () => {
  it('has a checker for every channel, and no-argument methods refuse arguments', () => {
    expect(Object.keys(argumentCheckers).sort()).toEqual(Object.keys(hostChannels).sort());
    for (const method of ['recentFiles', 'recoveryOffer', 'dismissRecovery', 'hostInfo', 'openDocument'] as const) {
      expect(argumentCheckers[method](['x']).ok).toBe(false);
    }
  });
});
