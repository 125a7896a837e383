import { describe, expect, it } from 'vitest';
import type { FluidDefinition } from '../../db/schema/fluids';
import { uncertaintiesFromFluid } from './spread-uncertainties';

const property = (uncertaintyPercent: number, distribution: 'normal' | 'uniform' = 'normal') => ({ value: '', source: '', uncertaintyPercent, distribution, si: 1, siUnit: '' });

describe('uncertaintiesFromFluid', () => {
  it('maps the stated ± % onto layer fields, skips zero, caps above 50 % and keeps the distribution', () => {
    const definition = {
      density: property(2),
      expansion: property(0),
      viscosity: { ...property(60), law: 'points', fitPreExponential: 1, fitActivationTemperature: 0, fitRmsRelativeError: 0 },
      surfaceTension: property(5, 'uniform'),
      surfaceTensionSlope: property(20),
      conductivity: property(10),
      heatCapacity: null,
      thermalDiffusivity: property(10),
      soluteDiffusivity: null,
      soluteSurfaceTensionSlope: null,
    } as unknown as FluidDefinition;
    const { uncertainties, capped } = uncertaintiesFromFluid(definition);
    expect(uncertainties).toEqual([
      { name: 'density', uncertaintyPercent: 2, distribution: 'normal' },
      { name: 'viscosity', uncertaintyPercent: 50, distribution: 'normal' },
      { name: 'conductivity', uncertaintyPercent: 10, distribution: 'normal' },
      { name: 'surfaceTension', uncertaintyPercent: 5, distribution: 'uniform' },
      { name: 'dSigmaDT', uncertaintyPercent: 20, distribution: 'normal' },
    ]);
    expect(capped).toEqual(['viscosity']);
  });
});
