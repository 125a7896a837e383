import { MOLAR_GAS_CONSTANT } from '../../units/constants';
import { requirePositive } from '../groups/require-positive';

/** Standard atmosphere, 101 325 Pa exactly (10th CGPM 1954, Resolution 4). */
const STANDARD_ATMOSPHERE = 101_325;

/** A ventilation caution for one oven zone: numbers plus the wording shown beside them. */
export interface SolventVentilationCaution {
  kind: 'solvent-ventilation';
  /** Fraction of the LFL the exhaust is held to: 0.25, or 0.5 with continuous monitoring [-]. */
  lflFraction: number;
  /** Solvent vapour volume rate at exhaust temperature and pressure [m³/s]. */
  vapourVolumeRate: number;
  /** Fresh air needed at exhaust conditions, Q ≥ V̇_vapour/(f·LFL) [m³/s]. */
  freshAirRequired: number;
  /** Plain-language caution; always defers to the standards and the authority having jurisdiction. */
  text: string;
  /** Documents the caution defers to. */
  defersTo: readonly string[];
  /** Closing notice shown with every caution. */
  notice: string;
}

function sig3(x: number): string {
  return Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : String(x);
}

/**
 * Fresh air needed to keep a zone's exhaust at or below a fraction of the solvent's lower
 * flammable limit (LFL), returned as a caution, not a design value.
 *
 * ## Method
 * Vapour volume at exhaust conditions from the ideal gas law, V̇_vapour = ṁ·R·T/(M·p); fresh air
 * Q ≥ V̇_vapour/(f·LFL) with f = 0.25, or 0.5 where continuous solvent-vapour monitoring and
 * control is installed. Q is slightly conservative (it ignores the vapour's own share of the
 * exhaust volume). The LFL is used as given: it falls as temperature rises, so pass the value
 * corrected to oven temperature (correction from memory — verify against the standard). The
 * standard requires sizing at the maximum solvent load, not a modelled one.
 *
 * ## References
 * - NFPA 86, Standard for Ovens and Furnaces (Class A ovens: ≤ 25 % LFL; up to 50 % LFL with
 *   continuous solvent-vapour monitoring and control); clause numbers and edition to verify.
 * - EN 1539:2015 Dryers and ovens, in which flammable substances are released — Safety requirements.
 * - Tiesinga E. et al. (2021) CODATA 2018, Rev. Mod. Phys. 93, 025010 (R, for the ideal gas law).
 *
 * @param input.solventMassRate - solvent evaporated in the zone [kg/s], ≥ 0
 * @param input.molarMass - solvent molar mass [kg/mol], > 0
 * @param input.lowerFlammableLimit - LFL as a volume fraction [-], in (0, 1) (1.1 % → 0.011)
 * @param input.exhaustTemperature - exhaust gas temperature [K], > 0
 * @param input.exhaustPressure - exhaust absolute pressure [Pa], > 0; default 101 325
 * @param input.continuousMonitoring - continuous solvent-vapour monitoring and control installed
 * @returns the caution object (frozen)
 * @example solventVentilationCaution({ solventMassRate: 0.0921, molarMass: 0.0921, lowerFlammableLimit: 0.011, exhaustTemperature: 273.15, continuousMonitoring: false }).freshAirRequired
 * // ≈ 8.15 (1 mol/s → 0.0224 m³/s at 0 °C, 1 atm; ÷ (0.25 × 0.011))
 */
export function solventVentilationCaution(input: {
  solventMassRate: number;
  molarMass: number;
  lowerFlammableLimit: number;
  exhaustTemperature: number;
  exhaustPressure?: number;
  continuousMonitoring: boolean;
}): SolventVentilationCaution {
  const m = requirePositive('solventMassRate', input.solventMassRate, 'kg/s', { allowZero: true });
  const molar = requirePositive('molarMass', input.molarMass, 'kg/mol');
  const lfl = requirePositive('lowerFlammableLimit', input.lowerFlammableLimit, '-');
  if (lfl >= 1) throw new RangeError(`lowerFlammableLimit must be a volume fraction < 1 [-] (1.1 % → 0.011), got ${lfl}`);
  const t = requirePositive('exhaustTemperature', input.exhaustTemperature, 'K');
  const p = requirePositive('exhaustPressure', input.exhaustPressure ?? STANDARD_ATMOSPHERE, 'Pa');
  const f = input.continuousMonitoring ? 0.5 : 0.25;
  const vapourVolumeRate = (m * MOLAR_GAS_CONSTANT * t) / (molar * p);
  const freshAirRequired = vapourVolumeRate / (f * lfl);
  const pct = Math.round(f * 100);
  const text =
    `Solvent vapour: keep this zone's exhaust at or below ${pct} % of the lower flammable limit` +
    (input.continuousMonitoring ? ' (allowed only with continuous solvent-vapour monitoring and control)' : '') +
    `. At the modelled load of ${sig3(m * 3600)} kg/h this needs at least ${sig3(freshAirRequired * 60)} m³/min of fresh air` +
    ` at ${sig3(t - 273.15)} °C exhaust (LFL ${sig3(lfl * 100)} vol %, used as given: correct it to oven temperature).` +
    ' Size ventilation at the maximum solvent load, never bypass purge or interlocks, and confirm with' +
    ' NFPA 86 / EN 1539 and your authority having jurisdiction.';
  return Object.freeze({
    kind: 'solvent-ventilation' as const,
    lflFraction: f,
    vapourVolumeRate,
    freshAirRequired,
    text,
    defersTo: Object.freeze(['NFPA 86 Standard for Ovens and Furnaces', 'EN 1539:2015 Dryers and ovens, in which flammable substances are released', 'the authority having jurisdiction']),
    notice:
      'QuietLayer predicts flow behaviour; it is not a safety design tool. Follow NFPA 86 / EN 1539 (or your local code), your insurer\'s requirements and your authority having jurisdiction.',
  });
}
