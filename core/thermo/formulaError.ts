/** A user error in a formula: where (0-based index into the text given) and what. */
export interface FormulaError {
  position: number;
  /** The offending piece of text. */
  text: string;
  /** One line naming the problem and the character (1-based) where it is. */
  message: string;
}

/** Builds a {@link FormulaError} whose message points at character `position + 1` of `formula`. */
export function formulaError(formula: string, position: number, text: string, problem: string): FormulaError {
  return { position, text, message: `'${formula}', character ${position + 1}: ${problem}` };
}
