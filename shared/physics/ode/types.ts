/**
 * Public types of QuietLayer's adaptive ODE integrator (see integrate-adaptive.ts).
 * All arrays are plain number arrays; the integrator never mutates what the caller passes in.
 */

/**
 * Right-hand side f(t, y) of the system dy/dt = f(t, y).
 * Must return a fresh array of the same length as y (it may not keep a reference to y).
 */
export type OdeRightHandSide = (t: number, y: readonly number[]) => number[];

/** Which sign changes of an event function count as a crossing. */
export type EventDirection = 'rising' | 'falling' | 'either';

/** A threshold to locate: the integrator reports each t where g(t, y(t)) crosses zero. */
export interface OdeEvent {
  /** Name returned with each crossing, e.g. 'margin-below-1'. */
  name: string;
  /** Event function g(t, y); a crossing is a change of sign between two accepted steps. */
  g: (t: number, y: readonly number[]) => number;
  /** 'rising' (− to +), 'falling' (+ to −) or 'either' (default). */
  direction?: EventDirection;
  /** Stop the integration at the first crossing (default false). */
  terminal?: boolean;
}

/** Options of integrateAdaptive. */
export interface AdaptiveOptions {
  /** Relative tolerance per component [-], > 0; default 1e-6. */
  rtol?: number;
  /** Absolute tolerance per component, a number or one per component [units of y], > 0; default 1e-9. */
  atol?: number | readonly number[];
  /** Largest step allowed [units of t], > 0; default |tEnd − t0|. */
  maxStep?: number;
  /** First step to try [units of t]; default chosen by the Hairer–Nørsett–Wanner starting-step algorithm. */
  initialStep?: number;
  /** Step budget: most steps (accepted + rejected) before giving up; default 100 000. */
  maxSteps?: number;
  /** Times in [t0, tEnd] where the dense output is sampled (any order; returned sorted). */
  outputTimes?: readonly number[];
  /** Thresholds to locate on the dense output. */
  events?: readonly OdeEvent[];
  /** Keep every accepted step in the result (default true). */
  keepSteps?: boolean;
  /** Return the dense-output coefficients of every accepted step (default false); read them with denseOutputAt. */
  dense?: boolean;
}

/**
 * Dense-output coefficients of one accepted step on [t0, t0 + h]: with s = (t − t0)/h,
 * y(t) = r1 + s·(r2 + (1 − s)·(r3 + s·(r4 + (1 − s)·r5))) (Hairer, Nørsett & Wanner 1993, §II.6).
 */
export interface DenseSegment {
  t0: number;
  h: number;
  r1: number[];
  r2: number[];
  r3: number[];
  r4: number[];
  r5: number[];
}

/** One located event crossing. */
export interface OdeEventHit {
  /** Name of the event. */
  name: string;
  /** Time of the crossing [units of t]. */
  t: number;
  /** State at the crossing (from the dense output). */
  y: number[];
  /** 'rising' or 'falling'. */
  direction: 'rising' | 'falling';
}

/** How an integration ended. */
export type OdeStatus = 'completed' | 'terminated-by-event' | 'step-budget-exhausted' | 'step-size-underflow';

/** Result of integrateAdaptive. */
export interface OdeSolution {
  status: OdeStatus;
  /** Time the integration reached [units of t] (tEnd when completed). */
  tFinal: number;
  /** State at tFinal. */
  yFinal: number[];
  /** Times of the accepted steps, starting with t0 (empty arrays when keepSteps is false). */
  stepTimes: number[];
  /** States at stepTimes. */
  stepStates: number[][];
  /** outputTimes sorted ascending in the direction of integration, limited to the part reached. */
  outputTimes: number[];
  /** Dense-output states at outputTimes. */
  outputStates: number[][];
  /** Event crossings in time order. */
  events: OdeEventHit[];
  /** Dense-output segments in time order (empty unless options.dense). */
  dense: DenseSegment[];
  /** Counters: accepted and rejected steps, right-hand-side evaluations. */
  stats: { accepted: number; rejected: number; evaluations: number };
}
