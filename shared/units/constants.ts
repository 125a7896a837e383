/**
 * Physical constants used by the QuietLayer core, each with its value, unit and source.
 * Every value here is exact by definition; none is a rounded or measured figure.
 */

/**
 * Standard acceleration of gravity, g_n = 9.806 65 m/s² [m/s²], exact by definition.
 *
 * ## References
 * - 3rd CGPM (1901), Comptes rendus p. 70; restated in BIPM (2019) "The International System of
 *   Units (SI)", 9th ed. (SI Brochure).
 */
export const STANDARD_GRAVITY = 9.806_65;

/**
 * The Celsius zero expressed in kelvin, 0 °C = 273.15 K [K], exact by definition.
 *
 * ## References
 * - BIPM (2019) "The International System of Units (SI)", 9th ed., §2.3.1 (t/°C = T/K − 273.15).
 */
export const CELSIUS_ZERO_KELVIN = 273.15;

/**
 * Molar gas constant R = N_A·k = 8.314 462 618 153 24 J/(mol·K), exact since the 2019 SI redefinition.
 *
 * ## References
 * - Tiesinga E. et al. (2021) "CODATA recommended values of the fundamental physical constants: 2018",
 *   Rev. Mod. Phys. 93, 025010. doi:10.1103/RevModPhys.93.025010
 */
export const MOLAR_GAS_CONSTANT = 8.314_462_618_153_24;

/**
 * The international inch, 1 in = 0.0254 m [m], exact by definition (so 1 mil = 25.4 µm exactly).
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) "Guide for the Use of the International System of Units (SI)",
 *   NIST Special Publication 811, Appendix B.
 */
export const INCH_METRE = 0.0254;
