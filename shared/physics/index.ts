/**
 * QuietLayer's physics core: pure functions, SI units, each formula with its published source.
 * Re-exports every area: dimensionless groups, base state, lateral-gradient flow, property laws,
 * the linear stability solver, sizing answers and batch evaluation.
 */
export * from './groups';
export * from './base-state';
export * from './lateral-flow';
export * from './properties';
export * from './stability';
export * from './sizing';
export * from './batch';
export * from './drying';
export * from './ode';
