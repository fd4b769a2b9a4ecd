import { unitLabel } from '../units/energy.ts';
import type { AnnotationPlan } from './annotationPlans.ts';
import type { FigureContext } from './figureContext.ts';
import { layoutRichText, type RichLine } from './text/layoutRichText.ts';
import type { Span } from './text/parseMarkup.ts';
import { energyDecimals } from '../format/energyDecimals.ts';

/** An energy difference for an annotation: fixed decimals, U+2212 for minus, the unit when the figure prints units. */
export function differenceText(value: number, ctx: FigureContext): string {
  const fixed = Math.abs(value).toFixed(energyDecimals(ctx.doc.settings, ctx.unit));
  const signed = value < 0 && Number(fixed) !== 0 ? `\u2212${fixed}` : fixed;
  return ctx.doc.figure.energyFormat === 'withUnit' ? `${signed} ${unitLabel(ctx.unit)}` : signed;
}

/**
 * The lines of a barrier or span label: "ΔG‡ = 14.2" from a minimum up to a TS (plain
 * "ΔG = …" otherwise), "δE = 22.5" for an energetic span, with a second line naming the
 * next turnover's TDTS when the bracket wraps round.
 */
export function annotationLines(plan: Exclude<AnnotationPlan, { kind: 'text' }>, ctx: FigureContext): RichLine[] {
  const q = ctx.doc.settings.quantity;
  const set = (spans: Span[]) => layoutRichText(spans, ctx.metrics, ctx.sizeMm);
  if (plan.kind === 'barrier') {
    const dagger = plan.from.kind === 'min' && plan.to.kind === 'ts';
    return [set([{ text: `Δ${q}`, shift: 'base' }, ...(dagger ? [{ text: '‡', shift: 'sup' as const }] : []), { text: ` = ${differenceText(plan.value, ctx)}`, shift: 'base' }])];
  }
  const first = set([{ text: `δE = ${differenceText(plan.deltaE, ctx)}`, shift: 'base' }]);
  return plan.wrap ? [first, set([{ text: `to ${plan.tdtsLabel} of the next turnover`, shift: 'base' }])] : [first];
}
