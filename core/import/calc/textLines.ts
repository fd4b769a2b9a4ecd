/** Splits output text into lines (any line ending); a reader walks them once. */
export function textLines(text: string): string[] {
  return text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
}

/** Reads a Fortran-style number ("-0.7624D+02", "1.0E-3", "0.177132"); null when it is not one. */
export function fortranNumber(text: string | undefined): number | null {
  if (text === undefined) return null;
  const value = Number(text.trim().replace(/[dD]/, 'e'));
  return text.trim() !== '' && Number.isFinite(value) ? value : null;
}
