/** One safety caution shown with every Melt pool flow result and on every Process sheet. */
export interface WeldingCaution {
  readonly id: string;
  readonly title: string;
  readonly text: string;
  /** Where the caution comes from; "from memory — verify" marks a citation not yet checked. */
  readonly basis: string;
}

/**
 * Welding, laser and powder-bed cautions for the melt-pool process kind, in display order, and
 * the closing statement that QuietLayer is not a safety or qualification tool.
 *
 * ## References
 * - ASME Boiler and Pressure Vessel Code, Section IX, Welding, Brazing and Fusing Qualifications.
 * - ANSI Z49.1 "Safety in Welding, Cutting, and Allied Processes" (from memory — verify edition).
 * - ANSI Z136.1 / IEC 60825-1 laser safety (from memory — verify).
 * - 29 CFR 1910.1026 Chromium (VI) (from memory — verify).
 * - NFPA 51B "Fire Prevention During Welding, Cutting, and Other Hot Work" (from memory — verify).
 * - Heiple C. R., Roper J. R. (1982) Welding Journal 61(4):97s–102s; Mills K. C., Keene B. J.
 *   (1990) Int. Mater. Rev. 35(4):185–216.
 */
export const WELDING_CAUTIONS: readonly WeldingCaution[] = Object.freeze(
  [
    {
      id: 'qualified-procedure',
      title: 'Qualified procedures release production work',
      text:
        'A predicted pool shape is a tendency, not a release. Only a welding procedure qualified to the governing code ' +
        '(for example ASME Section IX) with qualified welders, or an additive-manufacturing qualification build, ' +
        'releases production work. Follow local codes and your authority having jurisdiction.',
      basis: 'ASME BPVC Section IX',
    },
    {
      id: 'fume',
      title: 'Fume, including hexavalent chromium',
      text:
        'Welding stainless and high-alloy steels gives fume containing hexavalent chromium, nickel and manganese compounds. ' +
        'Use local exhaust extraction, air monitoring against the applicable exposure limits, and respiratory protection ' +
        'where the assessment requires it.',
      basis: '29 CFR 1910.1026; ANSI Z49.1 (from memory — verify)',
    },
    {
      id: 'radiation',
      title: 'Arc ultraviolet and laser radiation',
      text:
        'The arc emits intense ultraviolet and infrared radiation that burns eyes and skin within seconds; lasers can blind ' +
        'by direct or reflected beam. Use filter lenses of the right shade, screens for bystanders, covered skin, and a ' +
        'laser safety programme with interlocked enclosures and a laser safety officer.',
      basis: 'ANSI Z49.1; ANSI Z136.1 / IEC 60825-1 (from memory — verify)',
    },
    {
      id: 'burns',
      title: 'Burns from hot metal and spatter',
      text:
        'Weld metal, parts and fixtures stay hot long after the arc or beam stops, and spatter carries molten metal. ' +
        'Wear flame-resistant clothing and gloves and treat every freshly welded part as hot.',
      basis: 'ANSI Z49.1 (from memory — verify)',
    },
    {
      id: 'fire',
      title: 'Fire and hot work',
      text:
        'Sparks and spatter travel several metres and ignite combustibles and solvent vapour. Work under a hot-work permit, ' +
        'clear or shield combustibles, keep extinguishers at hand and keep a fire watch after the work ends. Keep welding ' +
        'away from solvent-borne coating lines and their ovens.',
      basis: 'NFPA 51B (from memory — verify)',
    },
    {
      id: 'powder',
      title: 'Metal powders',
      text:
        'Fine metal powders used in powder-bed fusion can be combustible or reactive. Handle, store and sieve them under ' +
        'the applicable code and the supplier’s safety data sheet, with inert gas and grounding as required.',
      basis: 'applicable code — from memory, verify',
    },
    {
      id: 'mill-test-limits',
      title: 'Sulfur on the mill-test report is not the whole story',
      text:
        'Oxygen, selenium, aluminium, calcium and cerium also change the flow direction and the penetration, and a mill-test ' +
        'report can be wrong or omit trace elements. Confirm penetration with trial welds on the actual heats.',
      basis: 'Heiple & Roper (1982); Mills & Keene (1990)',
    },
    {
      id: 'not-a-safety-tool',
      title: 'Scope',
      text:
        'QuietLayer predicts flow behaviour; it is not a safety design tool and does not qualify a procedure. Follow your ' +
        'qualified procedures, local codes, your insurer’s requirements and your authority having jurisdiction.',
      basis: 'QuietLayer scope statement',
    },
  ].map((caution) => Object.freeze(caution)),
);
