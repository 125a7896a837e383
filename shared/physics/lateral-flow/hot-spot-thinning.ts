import { requirePositive } from '../groups/require-positive';

/** Steady thinning of a horizontal layer at a hot spot (see {@link hotSpotThinning}). */
export interface HotSpotThinning {
  /** Small-deflection estimate of the depth drop, Δh ≈ 3Δσ/(2ρ g h₀) [m]. */
  readonly linearDepression: number;
  /** Depth at the hot spot from the full balance, √(h₀² − 3Δσ/(ρg)) [m]; 0 when the film ruptures. */
  readonly hotSpotDepth: number;
  /** Depth drop h₀ − h_hot from the full balance [m]. */
  readonly depression: number;
  /** True when the balance has no positive depth: the film thins to a dry spot. */
  readonly ruptures: boolean;
}

/**
 * Steady thinning of a horizontal liquid layer at a hot spot, where thermocapillary stress is balanced
 * by the hydrostatic pressure of the displaced liquid.
 *
 * ## Method
 * Lubrication theory for a layer of local depth h(x) on a closed tray (no net flux). The flux is
 * Q = τ h²/(2μ) − (h³/(3μ))·∂p/∂x with τ = dσ/dx and hydrostatic ∂p/∂x = ρ g dh/dx (capillary
 * pressure σ h_xx neglected: lateral scale ≫ capillary length √(σ/ρg)). Q = 0 gives
 * ρ g h dh/dx = (3/2) dσ/dx, which integrates exactly to h₀² − h_hot² = 3Δσ/(ρ g), with h₀ the depth
 * where σ is highest (the cold side) and Δσ = σ_cold − σ_hot = |dσ/dT|·ΔT. For small deflection
 * (h ≈ h₀): Δh ≈ 3Δσ/(2ρ g h₀). When 3Δσ/(ρg) ≥ h₀² no steady film remains: a dry spot opens.
 * (Derivation ours from the cited thin-film equation.)
 *
 * ## References
 * - Oron A., Davis S. H., Bankoff S. G. (1997) "Long-scale evolution of thin liquid films", Rev. Mod.
 *   Phys. 69(3), 931–980, eq. 2.32 (thin-film flux with thermocapillary stress). doi:10.1103/RevModPhys.69.931
 * - Tan M. J., Bankoff S. G., Davis S. H. (1990) "Steady thermocapillary flows of thin liquid layers.
 *   I. Theory", Phys. Fluids A 2(3), 313–321. doi:10.1063/1.857781
 *
 * @param input.surfaceTensionDifference - Δσ = σ_cold − σ_hot [N/m], ≥ 0
 * @param input.density - ρ [kg/m³], > 0
 * @param input.gravity - g [m/s²], > 0
 * @param input.depth - depth h₀ on the cold side [m], > 0
 * @returns frozen {@link HotSpotThinning}
 * @example hotSpotThinning({ surfaceTensionDifference: 1e-3, density: 1000, gravity: 9.81, depth: 1e-3 }).linearDepression // ≈ 1.529e-4
 */
export function hotSpotThinning(input: {
  surfaceTensionDifference: number;
  density: number;
  gravity: number;
  depth: number;
}): HotSpotThinning {
  const dSigma = requirePositive('surfaceTensionDifference', input.surfaceTensionDifference, 'N/m', { allowZero: true });
  const rho = requirePositive('density', input.density, 'kg/m³');
  const g = requirePositive('gravity', input.gravity, 'm/s²');
  const h0 = requirePositive('depth', input.depth, 'm');
  const drop = (3 * dSigma) / (rho * g);
  const remaining = h0 * h0 - drop;
  const ruptures = remaining <= 0;
  const hotSpotDepth = ruptures ? 0 : Math.sqrt(remaining);
  return Object.freeze({
    linearDepression: drop / (2 * h0),
    hotSpotDepth,
    depression: h0 - hotSpotDepth,
    ruptures,
  });
}
