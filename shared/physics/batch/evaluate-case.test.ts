import { describe, expect, it } from 'vitest';
import refs from '../../../tests/fixtures/onset-references.json';
import { onsetCaseResultFields } from '../../schemas/onset';
import { evaluateCase } from './evaluate-case';

const walls = { bottom: 'rigid', bottomThermal: 'conducting', top: 'surface' } as const;

describe('evaluateCase', () => {
  it('returns every documented field, id first and error last', () => {
    expect(Object.keys(evaluateCase({ id: 'a', ...walls, marangoni: 40 }))).toEqual([...onsetCaseResultFields]);
    expect(Object.keys(evaluateCase({ id: 'a', ...walls, marangoni: 'x' }))).toEqual([...onsetCaseResultFields]);
  });
  it(`reads CSV text cells: Ma = "39.8035" is half of Pearson's ${refs.pearson.criticalMarangoni} (Pearson 1958)`, () => {
    const r = evaluateCase({ id: 'p', ...walls, rayleigh: '', marangoni: '39.8035', biot: '' });
    expect(r.error).toBeNull();
    expect(Math.abs(r.margin! / 2 - 1)).toBeLessThan(2e-5);
    expect(r.biot).toBe(0);
  });
  it('names a misspelt field, a mixed case and a missing physical field', () => {
    expect(evaluateCase({ id: 't', ...walls, rayleigh: 1, viscocity: 2 }).error).toMatch(/^viscocity: is not a known field/);
    expect(evaluateCase({ id: 'm', ...walls, rayleigh: 1, density: 2 }).error).toMatch(/^rayleigh: give either dimensionless fields/);
    const missing = evaluateCase({ id: 'q', ...walls, density: 1000, viscosity: 0.01, conductivity: 0.1, heatCapacity: 1000, expansion: 0, surfaceTension: 0.03, dSigmaDT: -1e-4, depth: 1e-4 });
    expect(missing.error).toBe('deltaT: is required for a physical case');
  });
  it('names bad boundary words and non-finite numbers', () => {
    expect(evaluateCase({ id: 'b', bottom: 'sticky', bottomThermal: 'conducting', top: 'surface', marangoni: 1 }).error).toMatch(/^bottom: must be rigid \| free, got "sticky"/);
    expect(evaluateCase({ id: 'n', ...walls, marangoni: 'NaN' }).error).toMatch(/^marangoni: must be a finite number/);
    expect(evaluateCase({ id: 'i', ...walls, rayleigh: Infinity }).error).toMatch(/^rayleigh: must be a finite number/);
    expect(evaluateCase({ id: 'e', ...walls }).error).toMatch(/^rayleigh: is required/);
  });
  it('refuses a case that is not an object', () => {
    expect(evaluateCase(42).error).toMatch(/must be an object/);
    expect(evaluateCase(null).id).toBe('');
  });
  it('leaves the margin empty when there is no stationary onset (heated from above)', () => {
    const r = evaluateCase({ id: 'h', ...walls, rayleigh: -500, marangoni: -50 });
    expect(r.error).toBeNull();
    expect(r.margin).toBeNull();
    expect(r.regime).toBe('Quiet');
  });
});
