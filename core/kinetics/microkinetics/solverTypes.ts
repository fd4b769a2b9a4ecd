/** Right-hand side of an autonomous system y′ = f(y); writes f(y) into `dydt`. */
export type RhsFunction = (y: Float64Array, dydt: Float64Array) => void;

/** Writes the Jacobian ∂f_i/∂y_j row-major (index i·n + j) into `out`, which arrives zeroed. */
export type JacobianFunction = (y: Float64Array, out: Float64Array) => void;

/** Settings of `integrate`; every field is optional. */
export interface IntegrateOptions {
  /** Relative tolerance (default 1e-6). */
  rtol?: number;
  /** Absolute tolerance, one for all components or one per component (default 1e-12). */
  atol?: number | readonly number[];
  /** Times at which to report the state, ascending, within [tStart, tEnd]; the solver steps exactly onto each. Without them every accepted step is reported. */
  outputTimes?: readonly number[];
  /** Most steps (accepted + rejected) before giving up (default 100 000). */
  maxSteps?: number;
  /** Largest step size (default unlimited). */
  maxStep?: number;
  /** First trial step (default: estimated from f(y0)). */
  initialStep?: number;
  /** Reject steps that drive a component below −(its error scale) and clip smaller negatives to 0; true for all components or one flag per component. */
  nonNegative?: boolean | readonly boolean[];
  /** Called on every accepted state (after clipping), e.g. to project it back onto conservation laws; may change y in place. */
  project?: (y: Float64Array) => void;
  /** With `outputTimes`: called each time the solution reaches output times, with how many of them are done. */
  onOutput?: (done: number, total: number) => void;
}

/** Work counters of one integration. */
export interface SolverStats {
  steps: number;
  rejectedSteps: number;
  jacobianEvaluations: number;
  rhsEvaluations: number;
  luDecompositions: number;
}

/** Why an integration stopped early. */
export type SolverFailureCode = 'invalid-input' | 'step-underflow' | 'max-steps' | 'non-finite';

/** A failed integration: the reason, a readable message and where it stopped. */
export interface SolverFailure {
  code: SolverFailureCode;
  message: string;
  /** Time reached when the solver stopped. */
  t: number;
}

/** Reported times and states (states[k] belongs to times[k]); on failure, what was reached. */
export type IntegrationResult =
  | { ok: true; times: number[]; states: Float64Array[]; stats: SolverStats }
  | { ok: false; error: SolverFailure; times: number[]; states: Float64Array[]; stats: SolverStats };
