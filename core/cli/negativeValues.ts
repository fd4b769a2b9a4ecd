/** An option value that is a negative number ("-5", "-1e3", "-.5"). */
const NEGATIVE_NUMBER = /^-(\d|\.\d)/;

/**
 * Joins `--name -5` into `--name=-5` for options that take a value, so a negative number
 * written with a space is read as the option's value (node's parseArgs calls it ambiguous).
 */
export function attachNegativeValues(args: readonly string[], options: Readonly<Record<string, { type: 'string' | 'boolean'; short?: string }>>): string[] {
  const takesValue = new Set<string>();
  for (const [name, spec] of Object.entries(options)) {
    if (spec.type !== 'string') continue;
    takesValue.add(`--${name}`);
    if (spec.short) takesValue.add(`-${spec.short}`);
  }
  const out: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    const next = args[i + 1];
    if (arg === '--') { out.push(...args.slice(i)); break; }
    if (takesValue.has(arg) && next !== undefined && NEGATIVE_NUMBER.test(next)) {
      out.push(`${arg}=${next}`);
      i++;
    } else out.push(arg);
  }
  return out;
}
