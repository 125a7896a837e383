import { describe, expect, it } from 'vitest';
import { layerCheckInputSchema, processKindValues, type LayerCheck } from '../../../../shared/schemas/layer-checks';
import { processKindPresets } from '../../../../shared/fluids/process-kind-presets';
import { applyProcessKindPreset, emptyLayerCheckValues, fieldForInputPath, layerCheckToValues, valuesToEvaluationInput, valuesToLayerCheckInput } from './layer-check-form-values';

const fluidId = '6f1c2d3e-4a5b-4c6d-8e7f-9a0b1c2d3e4f';

describe('layer check form values', () => {
  it('a new check with a title is accepted by the shared schema in every heating mode', () => {
    for (const mode of ['deltaT', 'substrate-air', 'heat-flux', 'evaporation'] as const) {
      const values = { ...emptyLayerCheckValues(fluidId), title: 'Line 2', heatingMode: mode };
      const result = layerCheckInputSchema.safeParse(valuesToLayerCheckInput(values));
      expect(result.success, mode).toBe(true);
      expect(result.data?.heating.mode).toBe(mode);
    }
  });

  it('sends no lateral difference unless it is switched on, and a blank Δc as null', () => {
    const input = valuesToLayerCheckInput({ ...emptyLayerCheckValues(fluidId), title: 'x' });
    expect(input.lateral).toBeNull();
    expect(input.soluteFractionDifference).toBeNull();
    const withLateral = valuesToLayerCheckInput({ ...emptyLayerCheckValues(fluidId), title: 'x', lateralOn: true, soluteFractionDifference: '0.05' });
    expect(withLateral.lateral).toEqual({ deltaT: '2 K', distance: '50 mm' });
    expect(withLateral.soluteFractionDifference).toBe(0.05);
  });

  it('waits for a fluid before asking for an evaluation', () => {
    expect(valuesToEvaluationInput(emptyLayerCheckValues(''))).toBeUndefined();
    expect(valuesToEvaluationInput(emptyLayerCheckValues(fluidId))).toMatchObject({ fluidId, depth: '50 µm' });
  });

  it('applies each process kind’s preset boundaries and heating mode', () => {
    for (const kind of processKindValues) {
      const values = applyProcessKindPreset(emptyLayerCheckValues(fluidId), kind);
      expect(values.heatingMode).toBe(processKindPresets[kind].heatingMode);
      expect(values.top).toBe(processKindPresets[kind].top);
    }
  });

  it('puts server errors beside the right box', () => {
    expect(fieldForInputPath('heating.deltaT')).toBe('deltaT');
    expect(fieldForInputPath('lateral.distance')).toBe('lateralDistance');
    expect(fieldForInputPath('bottom.thermal')).toBe('bottomThermal');
    expect(fieldForInputPath('no.such.path')).toBeUndefined();
  });

  it('a stored check comes back to the same body', () => {
    const check: LayerCheck = {
      id: fluidId, title: 'Caster B', notes: '', fluidId, fluidName: 'Toluene', fluidArchived: false, processKind: 'cast-film',
      temperature: '30 °C', depth: '80 µm', bottom: { mechanics: 'rigid', thermal: 'conducting' }, top: 'surface', deformableSurface: true,
      heating: { mode: 'evaporation', evaporationRate: '0.8 g/(m²·s)', latentHeat: '360 kJ/kg' }, lateral: { deltaT: '4 K', distance: '20 mm' },
      panelWidth: '1.2 m', soluteFractionDifference: 0.1, alertThreshold: 1.5, ownerId: null, ownerName: null, revision: 2, version: 2,
      savedMargin: 1.3, savedRegime: 'Quiet', createdAt: '', updatedAt: '',
    };
    const input = valuesToLayerCheckInput(layerCheckToValues(check));
    expect(input).toMatchObject({
      title: 'Caster B', processKind: 'cast-film', depth: '80 µm', heating: { mode: 'evaporation', evaporationRate: '0.8 g/(m²·s)', latentHeat: '360 kJ/kg' },
      lateral: { deltaT: '4 K', distance: '20 mm' }, panelWidth: '1.2 m', soluteFractionDifference: 0.1, alertThreshold: 1.5,
    });
    expect('heatTransferCoefficient' in input.heating).toBe(false);
  });
});
