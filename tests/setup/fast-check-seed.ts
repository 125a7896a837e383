/**
 * Property-based tests run with one fixed seed by default, so a CI run is repeatable and a red
 * run can be replayed exactly. Set FC_SEED to another integer to explore new cases, or
 * FC_SEED=random to let fast-check pick (it prints the seed of any failure).
 */
import fc from 'fast-check';

const chosen = process.env.FC_SEED ?? '20261202';
if (chosen !== 'random') {
  const seed = Number.parseInt(chosen, 10);
  if (!Number.isFinite(seed)) throw new Error(`FC_SEED must be an integer or "random", got "${chosen}"`);
  fc.configureGlobal({ ...fc.readConfigureGlobal(), seed });
}
