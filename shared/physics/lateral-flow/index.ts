/** Flow driven by a temperature difference along a layer, hot-spot thinning, climbing films, spreading. */
export { climbingFilmThickness } from './climbing-film-thickness';
export { closedLayerSurfaceSpeed } from './closed-layer-surface-speed';
export { closedLayerVelocity } from './closed-layer-velocity';
export { hotSpotThinning, type HotSpotThinning } from './hot-spot-thinning';
export { openFilmSurfaceSpeed } from './open-film-surface-speed';
export { openFilmVelocity } from './open-film-velocity';
export { spreadingCoefficient } from './spreading-coefficient';
export { thermocapillaryStress } from './thermocapillary-stress';
