/**
 * Wavelength of convection cells from the critical wavenumber, λ = 2π d / k_c.
 *
 * ## Method
 * The wavenumber is in units of 1/d, so the dimensional wavelength is 2πd/k_c. k_c = 0 (a long-wave
 * minimum) gives Infinity; NaN (no onset) gives NaN.
 *
 * ## References
 * - Chandrasekhar S. (1961) "Hydrodynamic and Hydromagnetic Stability", Oxford, ch. II §10–§16.
 *
 * @param depth - layer depth d [m], > 0
 * @param wavenumber - critical wavenumber k_c [1/d], ≥ 0
 * @returns wavelength [m]
 * @example cellWavelength(1e-3, 1.993) // ≈ 3.153e-3 (Pearson's cells ≈ 3.15 d)
 */
export function cellWavelength(depth: number, wavenumber: number): number {
  if (Number.isNaN(wavenumber)) return NaN;
  if (wavenumber === 0) return Infinity;
  return (2 * Math.PI * depth) / wavenumber;
}
