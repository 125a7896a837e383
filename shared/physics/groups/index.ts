/** Dimensionless groups of a heated liquid layer, one function per file, each with its source. */
export { biotNumber } from './biot-number';
export { bondNumber } from './bond-number';
export { crispationNumber } from './crispation-number';
export { dynamicBondNumber } from './dynamic-bond-number';
export { galileoNumber } from './galileo-number';
export { kinematicViscosity } from './kinematic-viscosity';
export { marangoniNumber } from './marangoni-number';
export { massTransferBiotNumber } from './mass-transfer-biot-number';
export { prandtlNumber } from './prandtl-number';
export { rayleighNumber } from './rayleigh-number';
export { requireFinite } from './require-finite';
export { requirePositive } from './require-positive';
export { solutalMarangoniNumber } from './solutal-marangoni-number';
export { thermalDiffusivity } from './thermal-diffusivity';
