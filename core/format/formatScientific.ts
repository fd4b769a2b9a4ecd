const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/**
 * A positive or negative quantity to three significant figures: plain between 0.01 and
 * 10 000 (trailing zeros kept: "0.0600"), else as "3.21 × 10⁻⁵"; always the typographic minus;
 * "—" for null or non-finite values.
 */
export function formatScientific(value: number | null, digits = 3): string {
  if (value === null || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 0.01 && abs < 1e4) {
    // toPrecision keeps significant trailing zeros ("0.0600"); above 10^digits it switches to "1.23e+3".
    const plain = value.toPrecision(digits);
    return (plain.includes('e') ? String(Number(plain)) : plain).replace('-', '−');
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const exp = String(Number(exponent)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
  return `${mantissa!.replace('-', '−')} × 10${exp}`;
}
