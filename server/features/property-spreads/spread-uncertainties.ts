import type { FluidDefinition } from '../../db/schema/fluids';
import type { SpreadUncertainty } from '../../../shared/schemas/property-spreads';

/**
 * The uncertainties a spread uses when the request names none: each fluid property with a stated
 * ± % above zero, mapped onto the layer field it feeds (dσ/dT → dSigmaDT). A stated uncertainty
 * above 50 % is capped at 50 % (the largest the normal reading allows, see the physics core's
 * SpreadPropertySpec); the cap is reported in `capped`.
 */
export function uncertaintiesFromFluid(definition: FluidDefinition): { uncertainties: SpreadUncertainty[]; capped: string[] } {
  const sources: [SpreadUncertainty['name'], { uncertaintyPercent: number; distribution: 'normal' | 'uniform' } | null][] = [
    ['density', definition.density],
    ['viscosity', definition.viscosity],
    ['conductivity', definition.conductivity],
    ['heatCapacity', definition.heatCapacity],
    ['expansion', definition.expansion],
    ['surfaceTension', definition.surfaceTension],
    ['dSigmaDT', definition.surfaceTensionSlope],
  ];
  const uncertainties: SpreadUncertainty[] = [];
  const capped: string[] = [];
  for (const [name, property] of sources) {
    if (!property || !(property.uncertaintyPercent > 0)) continue;
    const percent = Math.min(property.uncertaintyPercent, 50);
    if (percent < property.uncertaintyPercent) capped.push(name);
    uncertainties.push({ name, uncertaintyPercent: percent, distribution: property.distribution ?? 'normal' });
  }
  return { uncertainties, capped };
}
