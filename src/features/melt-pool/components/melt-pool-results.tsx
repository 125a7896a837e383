import type { MeltPoolAnswer } from '../../../../shared/schemas/melt-pool';
import { formatSignificant } from '../../../../shared/units/format-significant';
import { Notice } from '../../../components/ui/notice';
import { StatusBadge } from '../../../components/ui/status-badge';

const sig = (x: number, d = 3) => formatSignificant(x, d);
const shapeWords = {
  'shallow-wide': { word: 'Outward flow', line: 'Shallow, wide pool' },
  'deep-narrow': { word: 'Inward flow', line: 'Deeper, narrower pool' },
  intermediate: { word: 'Mixed flow', line: 'Between shallow-wide and deep-narrow' },
} as const;

/** The flow-direction verdict, the numbers behind it, and the model notes. */
export function MeltPoolResults({ answer }: { answer: MeltPoolAnswer }) {
  const shape = shapeWords[answer.poolShape];
  const rows: [string, string][] = [
    ['Sulfur (activity on the wt % scale)', `${sig(answer.sulfurPpm)} ppm (${sig(answer.activity)} wt %)`],
    ['σ at the pool edge / peak', `${sig(answer.surfaceTensionAtEdge * 1e3, 4)} / ${sig(answer.surfaceTensionAtPeak * 1e3, 4)} mN/m`],
    ['dσ/dT at the pool edge / peak', `${sig(answer.slopeAtEdge * 1e3)} / ${sig(answer.slopeAtPeak * 1e3)} mN/(m·K)`],
    ['dσ/dT changes sign at', answer.signChangeTemperature !== null ? `${Math.round(answer.signChangeTemperature)} K (inside the pool)` : answer.signChangeTemperatureWide !== null ? `${Math.round(answer.signChangeTemperatureWide)} K (outside the pool)` : 'nowhere from 1000 K to 3000 K'],
    ['Marangoni number Ma', sig(answer.marangoniNumber)],
    ['Surface velocity scale u', `${sig(answer.surfaceVelocity)} m/s`],
    ['Péclet number Pe = uL/κ', `${sig(answer.pecletNumber)}${answer.flowShapesPool ? ' (flow carries the heat: it sets the pool shape)' : ' (conduction dominates)'}`],
  ];
  return (
    <div className="flex flex-col gap-4">
      <section aria-labelledby="melt-verdict" className="rounded-md border border-slate-line bg-paper-raised p-4">
        <h2 id="melt-verdict" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Melt pool flow</h2>
        <div className="mt-2 flex flex-wrap items-center gap-3">
          <StatusBadge tone={answer.direction === 'outward' ? 'quiet' : answer.direction === 'inward' ? 'over' : 'close'}>{shape.word}</StatusBadge>
          <p className="text-lg font-semibold">{shape.line}</p>
        </div>
        <p className="mt-2">{answer.directionText}</p>
        <dl className="mt-3 grid gap-1 text-sm">
          {rows.map(([label, value]) => (
            <div key={label} className="flex flex-wrap justify-between gap-x-4 border-t border-slate-line pt-1">
              <dt className="text-ink-soft">{label}</dt>
              <dd className="font-semibold">{value}</dd>
            </div>
          ))}
        </dl>
        <p className="mt-2 text-sm text-ink-soft">{answer.velocityScaling}</p>
      </section>
      {answer.warnings.length > 0 && (
        <Notice tone="info" title="Notes on this result">
          <ul className="list-disc pl-5">
            {answer.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Notice>
      )}
    </div>
  );
}

/** Welding, laser and powder cautions; always shown with a melt-pool result. */
export function WeldingCautions({ cautions }: { cautions: MeltPoolAnswer['cautions'] }) {
  return (
    <Notice tone="caution" title="Welding cautions">
      <ul className="flex flex-col gap-2">
        {cautions.map((c) => (
          <li key={c.id}>
            <span className="font-semibold">{c.title}.</span> {c.text} <span className="text-sm text-ink-soft">({c.basis})</span>
          </li>
        ))}
      </ul>
    </Notice>
  );
}
