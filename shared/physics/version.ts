/**
 * Version of the numerical core (stability solver, sizing, quiet window, drying path, property spread).
 *
 * Every Process sheet stores the version its numbers were computed with, so that a sheet stays
 * reproducible and explainable after the solver changes. Raise it whenever a change to
 * shared/physics or shared/fluids can change a computed number (not for comments or refactors
 * that leave every result bit-for-bit the same): year.month of the change, then a counter.
 */
export const SOLVER_VERSION = '2026.12.1';
