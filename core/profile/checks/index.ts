import type { Document } from '../../model/schema.ts';
import type { ResolveContext } from '../context.ts';
import type { Finding, ResolvedPathway } from '../types.ts';
import type { CheckInput } from './checkContext.ts';
import { checkTransitionStates } from './transitionStates.ts';
import { checkDuplicateLabels } from './duplicateLabels.ts';
import { checkMassBalance } from './massBalance.ts';
import { checkSharedStates } from './sharedStates.ts';
import { checkCycleClosure } from './cycleClosure.ts';
import { checkHessMismatch } from './hessMismatch.ts';
import { checkExothermCaution } from './exothermCaution.ts';
import { checkEmptyLabels } from './emptyLabels.ts';
import { checkCalculations } from './calculationChecks.ts';

const CHECKS: readonly ((input: CheckInput) => Finding[])[] = [
  checkTransitionStates, checkDuplicateLabels, checkMassBalance, checkSharedStates, checkCycleClosure, checkHessMismatch, checkExothermCaution, checkEmptyLabels,
  checkCalculations,
];

/** Runs every consistency check on resolved pathways. */
export function runChecks(doc: Document, pathways: readonly ResolvedPathway[], ctx: ResolveContext): Finding[] {
  return CHECKS.flatMap((check) => check({ doc, pathways, ctx }));
}
