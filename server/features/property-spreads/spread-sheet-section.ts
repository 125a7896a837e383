import type { PropertySpread } from '../../../shared/schemas/property-spreads';
import { spreadFieldLabels, type SpreadField } from '../../../shared/schemas/property-spreads';
import { formatSignificant } from '../../../shared/units/format-significant';
import type { SheetSection } from '../drying-paths/drying-sheet-section';

const sig = (x: number | null, digits = 3) => (x === null ? '∞ (no onset possible)' : formatSignificant(x, digits));
const percent = (x: number) => `${formatSignificant(x * 100, 3)} %`;
const label = (name: string) => spreadFieldLabels[name as SpreadField] ?? name;

/**
 * The Property spread section of a process sheet, from a stored, finished spread (no sampling is
 * re-run: the sheet shows the stored numbers). Pure. A spread that is not finished gives a section
 * saying so, so a sheet never shows a partial result as if it were final.
 *
 * @param spread - the stored spread (API shape)
 * @returns heading, rows (seed, samples, onset probability with its 95 % interval, percentiles,
 *   the properties that move the margin most) and notes
 */
export function spreadSheetSection(spread: PropertySpread): SheetSection {
  const base = [
    { label: 'Samples and seed', value: `${spread.samples.toLocaleString('en-GB')} samples, seed ${spread.seed} (the same seed reproduces the run)` },
    { label: 'Check revision', value: String(spread.revision) },
    {
      label: 'Uncertainties',
      value: spread.uncertainties.map((u) => `${label(u.name)} ± ${formatSignificant(u.uncertaintyPercent, 3)} % (${u.distribution === 'normal' ? '1σ, normal' : 'half-width, uniform'})`).join('; '),
    },
  ];
  const r = spread.result;
  if (spread.status !== 'done' || !r) {
    return {
      title: 'Property spread',
      rows: base,
      paragraphs: [`This spread is ${spread.status} (${percent(spread.progress)} of the samples evaluated); no result is shown until it has finished.`],
      cautions: [],
    };
  }
  const p = r.marginPercentiles as { p5: number | null; p50: number | null; p95: number | null };
  const interval = r.onsetInterval95 as readonly [number, number];
  const rows = [
    ...base,
    { label: 'Probability of onset (margin < 1)', value: `${percent(r.onsetProbability)} (95 % interval ${percent(interval[0])} – ${percent(interval[1])})` },
    { label: 'Onset margin, 5th / 50th / 95th percentile', value: `${sig(p.p5)} × / ${sig(p.p50)} × / ${sig(p.p95)} ×` },
    ...r.sensitivity.slice(0, 3).map((s, i) => ({
      label: i === 0 ? 'Moves the margin most' : `Next (${i + 1})`,
      value: `${label(s.name)}: rank correlation ${formatSignificant(s.rankCorrelation, 2)} (scaling it up ${s.direction} the margin)`,
    })),
    { label: 'Evaluator', value: r.method === 'surrogate' ? 'validated response surface of the stability solver' : 'full stability solver per sample' },
  ];
  return {
    title: 'Property spread',
    rows,
    paragraphs: [
      `Monte Carlo over the stated property uncertainties; percentiles by ${r.percentileMethod === 'exact' ? 'exact ranking' : 'a fine log-spaced histogram'}.`,
      ...(r.fallbackReason ? [r.fallbackReason] : []),
    ],
    cautions: ['The margin is only as good as the dσ/dT, dσ/dc and viscosity data behind it: check the sources of each property.'],
  };
}
