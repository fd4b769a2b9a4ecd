import { ELEMENT_SYMBOLS, isElementSymbol } from '../../thermo/elements.ts';

/** Element symbol from an atomic number or a symbol in any case ("6", "c", "Cl"); null when neither. */
export function elementSymbol(text: string): string | null {
  if (/^\d+$/.test(text)) {
    const z = Number(text);
    return z >= 1 && z <= 118 ? ELEMENT_SYMBOLS[z - 1]! : null;
  }
  const symbol = text.charAt(0).toUpperCase() + text.slice(1).toLowerCase();
  return isElementSymbol(symbol) ? symbol : null;
}
