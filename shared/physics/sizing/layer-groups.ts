import { biotNumber } from '../groups/biot-number';
import { bondNumber } from '../groups/bond-number';
import { crispationNumber } from '../groups/crispation-number';
import { dynamicBondNumber } from '../groups/dynamic-bond-number';
import { galileoNumber } from '../groups/galileo-number';
import { kinematicViscosity } from '../groups/kinematic-viscosity';
import { marangoniNumber } from '../groups/marangoni-number';
import { prandtlNumber } from '../groups/prandtl-number';
import { rayleighNumber } from '../groups/rayleigh-number';
import { thermalDiffusivity } from '../groups/thermal-diffusivity';
import type { LayerGroups, PhysicalLayer } from './types';

/**
 * All dimensionless groups of a physical layer at its depth and ΔT.
 *
 * ## Method
 * κ = k/(ρc_p), ν = μ/ρ, then Ra = gβΔTd³/(νκ), Ma = (−dσ/dT)ΔTd/(μκ), Bi = hd/k, Pr = ν/κ,
 * Bo = ρgd²/σ, Bo_d = ρgβd²/(−dσ/dT), Cr = μκ/(σd), Ga = gd³/(νκ); each from its own function in
 * `groups/`, where its source is given.
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - Davis S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435. doi:10.1146/annurev.fl.19.010187.002155
 *
 * @param layer - physical layer (SI), assumed valid (see validatePhysicalLayer)
 * @returns frozen {@link LayerGroups}
 * @example layerGroups(layer).rayleigh // e.g. 669 at onset for a Nield layer
 */
export function layerGroups(layer: PhysicalLayer): LayerGroups {
  const kappa = thermalDiffusivity(layer);
  const nu = kinematicViscosity(layer);
  const common = { depth: layer.depth, thermalDiffusivity: kappa };
  return Object.freeze({
    rayleigh: rayleighNumber({ ...common, gravity: layer.gravity, expansion: layer.expansion, deltaT: layer.deltaT, kinematicViscosity: nu }),
    marangoni: marangoniNumber({ ...common, surfaceTensionSlope: layer.dSigmaDT, deltaT: layer.deltaT, viscosity: layer.viscosity }),
    biot: biotNumber(layer),
    prandtl: prandtlNumber({ kinematicViscosity: nu, thermalDiffusivity: kappa }),
    bond: bondNumber(layer),
    dynamicBond: dynamicBondNumber({ ...layer, surfaceTensionSlope: layer.dSigmaDT }),
    crispation: crispationNumber({ ...common, viscosity: layer.viscosity, surfaceTension: layer.surfaceTension }),
    galileo: galileoNumber({ ...common, gravity: layer.gravity, kinematicViscosity: nu }),
    thermalDiffusivity: kappa,
    kinematicViscosity: nu,
  });
}
