import { describe, expect, it } from 'vitest';
import { checkExportArgs, checkNoArgs, checkSaveArgs, IPC_LIMITS } from '../../../electron/ipcValidation.ts';

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
