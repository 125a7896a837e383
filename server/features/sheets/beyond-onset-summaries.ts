import {
  dryingPathSummarySchema,
  propertySpreadSummarySchema,
  type DryingPathSummary,
  type PropertySpreadSummary,
} from '../../../shared/schemas/sheets';

const finiteOrNull = (x: unknown): number | null => (typeof x === 'number' && Number.isFinite(x) ? x : null);

/**
 * The sheet's summary of a saved drying set-up (shared/schemas/drying-paths.ts DryingPathSummary),
 * or undefined when the stored summary does not have the expected shape (the sheet is still issued).
 */
export function dryingPathForSheet(title: string, stored: unknown): DryingPathSummary | undefined {
  const s = stored as {
    verdictText?: unknown;
    minThermalMargin?: unknown;
    minSolutalMargin?: unknown;
    zones?: { name?: unknown; residenceTime?: unknown; thicknessOut?: unknown; solidsOut?: unknown; maxFilmTemperature?: unknown; solventLitresPerMinute?: unknown; lflFraction?: unknown }[];
  } | null;
  const parsed = dryingPathSummarySchema.safeParse({
    title,
    verdictText: s?.verdictText,
    minThermalMargin: finiteOrNull(s?.minThermalMargin),
    minSolutalMargin: finiteOrNull(s?.minSolutalMargin),
    zones: Array.isArray(s?.zones)
      ? s.zones.map((z) => ({
          zone: z.name,
          residenceTime: z.residenceTime,
          thicknessOut: z.thicknessOut,
          solidsOut: z.solidsOut,
          maxFilmTemperature: z.maxFilmTemperature,
          solventLitresPerMinute: finiteOrNull(z.solventLitresPerMinute),
          lflFraction: finiteOrNull(z.lflFraction),
        }))
      : undefined,
  });
  return parsed.success ? parsed.data : undefined;
}

/**
 * The sheet's summary of a finished Property spread (shared/schemas/property-spreads.ts
 * SpreadRunResult), or undefined when the stored result does not have the expected shape.
 */
export function propertySpreadForSheet(stored: unknown): PropertySpreadSummary | undefined {
  const r = stored as {
    validSamples?: unknown;
    onsetProbability?: unknown;
    marginPercentiles?: { p5?: unknown; p50?: unknown; p95?: unknown };
    swing?: { name?: unknown; swing?: unknown }[];
  } | null;
  const parsed = propertySpreadSummarySchema.safeParse({
    samples: r?.validSamples,
    probabilityOfOnset: r?.onsetProbability,
    marginP05: finiteOrNull(r?.marginPercentiles?.p5),
    marginP50: finiteOrNull(r?.marginPercentiles?.p50),
    marginP95: finiteOrNull(r?.marginPercentiles?.p95),
    drivers: Array.isArray(r?.swing)
      ? [...r.swing]
          .filter((x) => typeof x.swing === 'number' && Number.isFinite(x.swing))
          .sort((a, b) => (b.swing as number) - (a.swing as number))
          .slice(0, 4)
          .map((x) => ({ property: x.name, swing: x.swing }))
      : undefined,
  });
  return parsed.success ? parsed.data : undefined;
}
