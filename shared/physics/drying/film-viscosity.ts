import { requirePositive } from '../groups/require-positive';
import { exponentialViscosity } from './exponential-viscosity';
import { kriegerDoughertyViscosity } from './krieger-dougherty-viscosity';
import type { ViscosityLaw } from './types';

/**
 * Viscosity of the drying film at a solids fraction and temperature, by the chosen law.
 *
 * ## Method
 * μ(φ, T) = μ_s(T)·f(φ) with f the Krieger–Dougherty factor (1 − φ/φ_m)^(−[η]φ_m) or the
 * exponential factor exp(Bφ). The solvent part follows Andrade's law
 * μ_s(T) = μ_s(T_ref)·exp(B_A(1/T − 1/T_ref)) when an activation temperature B_A is given, and is
 * constant otherwise. Polymer-specific temperature effects (e.g. WLF near the glass transition)
 * are not modelled.
 *
 * ## References
 * - Krieger I.M., Dougherty T.J. (1959) Trans. Soc. Rheol. 3:137–152. doi:10.1122/1.548848
 * - Arrhenius S. (1887) Z. Phys. Chem. 1:285–298. doi:10.1515/zpch-1887-0133
 * - Andrade E.N. da C. (1930) "The viscosity of liquids", Nature 125:309–310. doi:10.1038/125309b0
 *
 * @param law - the viscosity law and its constants
 * @param solidsFraction - φ [-], ≥ 0
 * @param temperature - film temperature [K], > 0
 * @returns viscosity [Pa·s]; Infinity when a Krieger–Dougherty film reaches φ_m
 * @example filmViscosity({ kind: 'exponential', solventViscosity: 1e-3, exponent: 10 }, 0.5, 300) // ≈ 0.1484
 */
export function filmViscosity(law: ViscosityLaw, solidsFraction: number, temperature: number): number {
  const t = requirePositive('temperature', temperature, 'K');
  const activation = law.activationTemperature ?? 0;
  let solventViscosity = law.solventViscosity;
  if (activation !== 0) {
    const tRef = requirePositive('viscosity.referenceTemperature', law.referenceTemperature ?? Number.NaN, 'K');
    solventViscosity = law.solventViscosity * Math.exp(activation * (1 / t - 1 / tRef));
  }
  if (law.kind === 'krieger-dougherty') {
    return kriegerDoughertyViscosity({
      solventViscosity,
      solidsFraction,
      maxPackingFraction: law.maxPackingFraction,
      intrinsicViscosity: law.intrinsicViscosity,
    });
  }
  return exponentialViscosity({ solventViscosity, solidsFraction, exponent: law.exponent });
}
