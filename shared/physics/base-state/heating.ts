/**
 * The ways a user can describe how a layer is heated (all SI: K, W/m², kg/(m²·s), J/kg, W/(m²·K)).
 * Temperatures of the substrate and the air are absolute [K]; `deltaT` is a difference [K].
 */
export type Heating =
  | { readonly kind: 'deltaT'; readonly deltaT: number }
  | {
      readonly kind: 'surfaceTemperatures';
      readonly substrateTemperature: number;
      readonly airTemperature: number;
      readonly heatTransfer: number;
    }
  | { readonly kind: 'heatFlux'; readonly heatFlux: number }
  | { readonly kind: 'evaporation'; readonly evaporationFlux: number; readonly latentHeat: number };
