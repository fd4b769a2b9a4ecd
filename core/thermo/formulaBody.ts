import { isElementSymbol } from './elements.ts';
import { formulaError, type FormulaError } from './formulaError.ts';
import { GROUP_ABBREVIATIONS } from './groups.ts';

type Counts = Record<string, number>;
type BodyResult = { ok: true; counts: Counts } | { ok: false; error: FormulaError };

const CLOSER: Readonly<Record<string, string>> = { '(': ')', '[': ']', '{': '}' };
const HYDRATE_DOT = /[·•∙*]/;

function addInto(target: Counts, source: Readonly<Counts>, times: number): void {
  for (const [element, n] of Object.entries(source)) target[element] = (target[element] ?? 0) + n * times;
}

/**
 * Parses the element part of a formula (no phase, no charge): element symbols and group
 * abbreviations with counts, nested (), [], {} groups with counts, and hydrate parts joined
 * by `·` or `*` with a leading multiplier (`CuSO4·5H2O`). `offset` is where `body` starts in
 * `formula`, so errors point into the text the user wrote.
 */
export function parseFormulaBody(formula: string, body: string, offset = 0): BodyResult {
  const fail = (at: number, text: string, problem: string): BodyResult => ({ ok: false, error: formulaError(formula, offset + at, text, problem) });
  if (body.length === 0) return fail(0, '', 'empty formula');
  const total: Counts = {};
  let i = 0;
  let part = 0;
  while (i <= body.length) {
    // One hydrate part: optional multiplier (not on the first part), then groups.
    const partStart = i;
    let multiplier = 1;
    const lead = /^[\d.]+/.exec(body.slice(i));
    if (lead) {
      if (part === 0) return fail(i, lead[0], "count before the formula (put coefficients in the reaction, e.g. '2 H2O')");
      multiplier = Number(lead[0]);
      if (!/^\d+(\.\d+)?$/.test(lead[0]) || !(multiplier > 0)) return fail(i, lead[0], `bad count '${lead[0]}'`);
      i += lead[0].length;
    }
    const stack: { counts: Counts; open: string; at: number }[] = [{ counts: {}, open: '', at: i }];
    while (i < body.length && !HYDRATE_DOT.test(body[i] ?? '')) {
      const ch = body[i] ?? '';
      let unit: Readonly<Counts>;
      if (ch in CLOSER) {
        stack.push({ counts: {}, open: ch, at: i });
        i += 1;
        continue;
      } else if (ch === ')' || ch === ']' || ch === '}') {
        if (stack.length === 1) return fail(i, ch, `unbalanced '${ch}'`);
        const group = stack.pop();
        if (group === undefined) throw new Error('formula stack underflow');
        if (CLOSER[group.open] !== ch) return fail(i, ch, `'${group.open}' at character ${offset + group.at + 1} closed by '${ch}'`);
        unit = group.counts;
        i += 1;
      } else {
        const token = /^(?:[A-Z][a-z]*|[nist][A-Z][a-z]*)/.exec(body.slice(i))?.[0];
        if (token === undefined) {
          if (/\d/.test(ch)) return fail(i, ch, `count '${ch}' without an element before it`);
          return fail(i, ch, `unexpected '${ch}'`);
        }
        const group = GROUP_ABBREVIATIONS[token];
        if (group) unit = group;
        else if (isElementSymbol(token)) unit = { [token]: 1 };
        else return fail(i, token, `unknown element symbol '${token}'`);
        i += token.length;
      }
      const countText = /^[\d.]+/.exec(body.slice(i))?.[0];
      let count = 1;
      if (countText !== undefined) {
        count = Number(countText);
        if (!/^\d+(\.\d+)?$/.test(countText) || !(count > 0)) return fail(i, countText, `bad count '${countText}'`);
        i += countText.length;
      }
      const parent = stack[stack.length - 1];
      if (parent === undefined) throw new Error('formula stack underflow');
      addInto(parent.counts, unit, count);
    }
    if (stack.length > 1) {
      const open = stack[stack.length - 1];
      return fail(open?.at ?? 0, open?.open ?? '', `unbalanced '${open?.open}' (never closed)`);
    }
    const partCounts = stack[0]?.counts ?? {};
    if (Object.keys(partCounts).length === 0) return fail(partStart, body.slice(partStart, i + 1), 'empty part of the formula');
    addInto(total, partCounts, multiplier);
    if (i >= body.length) break;
    i += 1;
    part += 1;
    if (i >= body.length) return fail(i - 1, body[i - 1] ?? '', 'nothing after the hydrate dot');
  }
  return { ok: true, counts: total };
}
