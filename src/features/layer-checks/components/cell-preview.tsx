import type { LayerEvaluation } from '../../../../shared/schemas/layer-checks';
import { formatInSystem, formatLengthForScale, type UnitSystem } from '../../../lib/unit-system';

const WIDTH = 360;
const HEIGHT = 200;

/** A round length for the scale bar: 1, 2 or 5 × 10ⁿ metres, near a quarter of the patch. */
function niceLength(target: number): number {
  const power = 10 ** Math.floor(Math.log10(target));
  const mantissa = target / power;
  return (mantissa >= 5 ? 5 : mantissa >= 2 ? 2 : 1) * power;
}

function hexagonPath(cx: number, cy: number, r: number): string {
  const corners = Array.from({ length: 6 }, (_, i) => {
    const angle = (Math.PI / 3) * i + Math.PI / 6;
    return `${(cx + r * Math.cos(angle)).toFixed(2)},${(cy + r * Math.sin(angle)).toFixed(2)}`;
  });
  return `M${corners.join('L')}Z`;
}

/**
 * The predicted surface over a patch of the panel, drawn to scale: hexagonal cells at the computed
 * centre-to-centre spacing when the layer is over onset, a plain level layer when it is quiet.
 * The patch shows about eight cells across (or the whole panel when that is narrower).
 */
export function CellPreview({ evaluation, panelWidth, system }: { evaluation: LayerEvaluation; panelWidth: number | null; system: UnitSystem }) {
  const spacing = evaluation.cells.hexagonSpacing;
  const over = evaluation.margin !== null && evaluation.margin < 1;
  const cellular = over && evaluation.regime !== 'long-wave-thinning' && spacing !== null && spacing > 0;
  const reference = cellular ? spacing! : evaluation.operatingPoint.depth * 20;
  const patchWidth = panelWidth !== null ? Math.min(panelWidth, reference * 8) : reference * 8;
  const metresPerPixel = patchWidth / WIDTH;
  const bar = niceLength(patchWidth / 4);
  const barPixels = bar / metresPerPixel;

  const cells: string[] = [];
  if (cellular) {
    const s = spacing! / metresPerPixel;
    const r = s / Math.sqrt(3);
    for (let row = -1; row * 1.5 * r < HEIGHT + r && cells.length < 4000; row += 1) {
      const y = row * 1.5 * r;
      for (let x = (Math.abs(row) % 2) * (s / 2) - s; x < WIDTH + s; x += s) cells.push(hexagonPath(x, y, r * 0.97));
    }
  }

  const caption = cellular
    ? `Cells about ${formatInSystem(spacing, 'length', system, 3)} centre to centre, drawn to scale over a patch ${formatLengthForScale(patchWidth, system)} wide${panelWidth !== null ? ` of the ${formatLengthForScale(panelWidth, system)} panel` : ''}.`
    : evaluation.regime === 'long-wave-thinning' && over
      ? `No cells: the layer thins over long distances (long-wave thinning, dry spots) rather than forming a cell pattern. Patch ${formatLengthForScale(patchWidth, system)} wide.`
      : `Quiet: no cells expected; the surface stays level. Patch ${formatLengthForScale(patchWidth, system)} wide.`;

  return (
    <figure className="flex flex-col gap-2" data-testid="cell-preview">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT + 28}`} role="img" aria-label={caption} className="h-auto w-full rounded-md border border-slate-line bg-paper-raised">
        <defs>
          <clipPath id="cell-patch">
            <rect x="0" y="0" width={WIDTH} height={HEIGHT} />
          </clipPath>
          <linearGradient id="thinning" x1="0" x2="1">
            <stop offset="0" stopColor="#dbe6ef" />
            <stop offset="0.5" stopColor="#f7f8f6" />
            <stop offset="1" stopColor="#dbe6ef" />
          </linearGradient>
        </defs>
        <g clipPath="url(#cell-patch)">
          <rect x="0" y="0" width={WIDTH} height={HEIGHT} fill={cellular ? '#eef3f7' : evaluation.regime === 'long-wave-thinning' && over ? 'url(#thinning)' : '#dbe6ef'} />
          {cells.length > 0 && <path d={cells.join('')} fill="#dbe6ef" stroke="#2d4f6c" strokeWidth={Math.max(0.4, Math.min(1.5, barPixels / 60))} />}
        </g>
        <g transform={`translate(12 ${HEIGHT + 10})`}>
          <line x1="0" y1="6" x2={barPixels} y2="6" stroke="#1d2733" strokeWidth="2.5" />
          <line x1="0" y1="1" x2="0" y2="11" stroke="#1d2733" strokeWidth="1.5" />
          <line x1={barPixels} y1="1" x2={barPixels} y2="11" stroke="#1d2733" strokeWidth="1.5" />
          <text x={barPixels + 8} y="10" fontSize="11" fill="#1d2733">
            {formatLengthForScale(bar, system, 2)}
          </text>
        </g>
      </svg>
      <figcaption className="text-sm text-ink-soft">{caption}</figcaption>
    </figure>
  );
}
