/**
 * Centre-to-centre spacing of hexagonal convection cells from the critical wavenumber,
 * a = 4π d / (√3 k_c).
 *
 * ## Method
 * A hexagonal planform is the sum of three rolls of equal wavenumber k whose wave vectors are 120°
 * apart. Those wave vectors are the shortest vectors of the reciprocal lattice of the triangular
 * lattice of cell centres; for a triangular lattice with spacing a they have length 4π/(√3 a), so
 * a = 4π/(√3 k) (in units of d). Derivation ours from the standard planform; the hexagon spacing is
 * 2/√3 ≈ 1.155 times the roll wavelength 2π/k.
 *
 * ## References
 * - Chandrasekhar S. (1961) "Hydrodynamic and Hydromagnetic Stability", Oxford, ch. II §16 (cell
 *   patterns, hexagonal cells as three superposed rolls).
 * - Koschmieder E. L. (1993) "Bénard Cells and Taylor Vortices", Cambridge University Press, ch. 2.
 *
 * @param depth - layer depth d [m], > 0
 * @param wavenumber - critical wavenumber k_c [1/d], ≥ 0
 * @returns spacing of cell centres [m] (Infinity for k_c = 0, NaN when no onset)
 * @example hexagonSpacing(1e-3, 1.993) // ≈ 3.641e-3
 */
export function hexagonSpacing(depth: number, wavenumber: number): number {
  if (Number.isNaN(wavenumber)) return NaN;
  if (wavenumber === 0) return Infinity;
  return (4 * Math.PI * depth) / (Math.sqrt(3) * wavenumber);
}
