/** Property laws: water per IAPWS, Andrade viscosity and its fit, linear density and surface tension. */
export { andradeViscosity, type AndradeViscosityLaw } from './andrade-viscosity';
export { fitAndradeViscosity, type AndradeViscosityFit } from './fit-andrade-viscosity';
export { linearDensity } from './linear-density';
export { linearSurfaceTension } from './linear-surface-tension';
export { waterDensity } from './water-density';
export { waterSurfaceTension } from './water-surface-tension';
export { waterSurfaceTensionSlope } from './water-surface-tension-slope';
export { waterViscosity } from './water-viscosity';
export { waterViscosityFromDensity } from './water-viscosity-from-density';
