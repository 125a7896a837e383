/**
 * Constants of the solute-adsorption surface-tension model for one binary melt
 * (Szyszkowski–Langmuir form, see `surfaceTensionWithSoluteAdsorption`).
 */
export interface SoluteAdsorptionParameters {
  /** Surface tension of the pure solvent metal at its melting point, γ_m° [N/m]. */
  readonly pureSurfaceTensionAtMelting: number;
  /** Negative of dγ/dT of the pure metal, A [N/(m·K)]. */
  readonly pureTemperatureCoefficient: number;
  /** Melting point of the pure metal, T_m [K]. */
  readonly meltingTemperature: number;
  /** Surface excess of solute at saturation, Γ_s [mol/m²]. */
  readonly saturationSurfaceExcess: number;
  /** Entropy factor of segregation, k₁ [-] (with activity in wt %). */
  readonly segregationEntropyFactor: number;
  /** Standard heat of adsorption, ΔH° [J/mol] (negative: adsorption is exothermic). */
  readonly adsorptionEnthalpy: number;
}

/**
 * Iron–sulfur constants of the adsorption model, activity taken as sulfur in wt %.
 *
 * ## References
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) "Surface tension of binary metal–surface active
 *   solute systems under conditions relevant to welding metallurgy", Metall. Trans. B
 *   19(3):483–491. doi:10.1007/BF02657748 — γ_m° = 1.943 N/m, A = 4.3×10⁻⁴ N/(m·K),
 *   T_m = 1809 K, Γ_s = 1.3×10⁻⁵ mol/m², k₁ = 3.18×10⁻³, ΔH° = −1.66×10⁵ J/mol.
 */
export const FE_S_ADSORPTION_PARAMETERS: SoluteAdsorptionParameters = Object.freeze({
  pureSurfaceTensionAtMelting: 1.943,
  pureTemperatureCoefficient: 4.3e-4,
  meltingTemperature: 1809,
  saturationSurfaceExcess: 1.3e-5,
  segregationEntropyFactor: 3.18e-3,
  adsorptionEnthalpy: -1.66e5,
});
