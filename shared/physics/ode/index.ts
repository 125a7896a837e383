/** Adaptive ODE integration (Dormand–Prince 5(4)) for QuietLayer's time-dependent models. */
export { integrateAdaptive } from './integrate-adaptive';
export { denseOutputAt } from './dense-output-at';
export type {
  AdaptiveOptions,
  DenseSegment,
  EventDirection,
  OdeEvent,
  OdeEventHit,
  OdeRightHandSide,
  OdeSolution,
  OdeStatus,
} from './types';
