import { describe, expect, it } from 'vitest';
import { fluidInputSchema } from '../../../../shared/schemas/fluids';
import { emptyFluidFormValues, formValuesToFluidInput } from './fluid-form-values';

function filledValues() {
  const values = emptyFluidFormValues();
  values.name = 'Test solvent';
  values.referenceTemperature = '68 °F';
  values.density = { value: '0.87 g/cm³', source: 'invented', uncertaintyPercent: 1, distribution: 'normal' };
  values.expansion = { value: '0.0011 1/K', source: '', uncertaintyPercent: Number.NaN, distribution: 'uniform' };
  values.surfaceTension.value = '35 dyn/cm';
  values.surfaceTensionSlope.value = '-0.1 mN/(m·K)';
  values.conductivity.value = '0.15 W/(m·K)';
  values.heatCapacity.value = '1.8 kJ/(kg·K)';
  values.viscosity.points = [{ temperature: '68 °F', value: '12 cP' }];
  return values;
}

describe('formValuesToFluidInput', () => {
  it('gives a body the shared fluid schema accepts, with blank optional properties left out', () => {
    const input = formValuesToFluidInput(filledValues());
    const parsed = fluidInputSchema.parse(input);
    expect(parsed.thermalDiffusivity).toBeUndefined();
    expect(parsed.soluteDiffusivity).toBeUndefined();
    expect(parsed.heatCapacity?.value).toBe('1.8 kJ/(kg·K)');
    expect(parsed.validFrom).toBeUndefined();
  });

  it('sends an emptied ± % box as 0 % rather than an invalid number', () => {
    expect(formValuesToFluidInput(filledValues()).expansion.uncertaintyPercent).toBe(0);
  });

  it('sends the Andrade constants, not the points, when that law is chosen', () => {
    const values = filledValues();
    values.viscosity.law = 'andrade';
    values.viscosity.preExponential = '3.7e-3 mPa·s';
    values.viscosity.activationTemperature = '1692 K';
    const input = formValuesToFluidInput(values);
    expect(input.viscosity).toMatchObject({ law: 'andrade', preExponential: '3.7e-3 mPa·s', activationTemperature: '1692 K' });
    expect(fluidInputSchema.safeParse(input).success).toBe(true);
  });

  it('keeps a blank required property so the schema names it', () => {
    const values = filledValues();
    values.density.value = '';
    const result = fluidInputSchema.safeParse(formValuesToFluidInput(values));
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((issue) => issue.path.join('.'))).toContain('density.value');
  });
});
