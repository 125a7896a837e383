import type { DryingPathAnswer } from '../../../../shared/schemas/drying-paths';
import { Notice } from '../../../components/ui/notice';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';
import { formatInSystem, useUnitSystem } from '../../../lib/unit-system';
import { formatSignificant } from '../../../../shared/units/format-significant';

const verdictWords: Record<DryingPathAnswer['onset']['verdict'], { tone: StatusTone; word: string; headline: string }> = {
  quiet: { tone: 'quiet', word: 'Quiet', headline: 'No pattern expected in the dry film' },
  'cells-die-out': { tone: 'close', word: 'Cells die out', headline: 'Cells can start but level out before the film freezes: no pattern expected' },
  'pattern-possible': { tone: 'close', word: 'Pattern possible', headline: 'Cells grow and only partly level out: a faint pattern is possible in the dry film' },
  'pattern-expected': { tone: 'over', word: 'Pattern expected', headline: 'Cells outlive the drying: a pattern is expected in the dry film' },
};

const sig = (x: number | null | undefined, digits = 3) => (x === null || x === undefined || !Number.isFinite(x) ? '∞' : formatSignificant(x, digits));
const eventWords: Record<string, string> = { 'zone-entry': 'Zone entry', 'cells-possible': 'Cells possible', 'quiet-again': 'Quiet again', 'film-frozen': 'Film frozen' };

/** Verdict in words, events, the per-zone table with solvent and fresh air, and the ventilation caution. */
export function DryingResults({ answer }: { answer: DryingPathAnswer }) {
  const [system] = useUnitSystem();
  const verdict = verdictWords[answer.onset.verdict];
  const { onset, massBalance } = answer;
  const events = answer.events.filter((e) => e.kind !== 'zone-entry');
  const lflPercent = Math.round((answer.zones.find((z) => z.ventilation)?.ventilation?.lflFraction ?? 0.25) * 100);

  return (
    <div className="flex flex-col gap-5">
      <section aria-labelledby="drying-verdict" className="rounded-md border border-slate-line bg-paper-raised p-4">
        <h2 id="drying-verdict" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">
          Verdict
        </h2>
        <div className="mt-2 flex flex-wrap items-center gap-3">
          <StatusBadge tone={verdict.tone}>{verdict.word}</StatusBadge>
          <p className="text-lg font-semibold text-ink">{verdict.headline}</p>
        </div>
        <p className="mt-2 text-ink">{onset.verdictText}</p>
        <dl className="mt-3 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Smallest solutal margin</dt><dd className="font-semibold">{sig(onset.minSolutalMargin)} ×</dd></div>
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Smallest thermal margin</dt><dd className="font-semibold">{sig(onset.minThermalMargin)} ×</dd></div>
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Cells possible from</dt><dd>{onset.cellsPossibleAt === null ? 'never' : `${sig(onset.cellsPossibleAt)} s (${onset.drive})`}</dd></div>
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Film frozen at</dt><dd>{onset.frozenAt === null ? 'not in the oven' : `${sig(onset.frozenAt)} s (${onset.frozenBy})`}</dd></div>
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Growth before freezing</dt><dd>{sig(onset.growthExponent)} e-folds</dd></div>
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Decay after recovery</dt><dd>{sig(onset.decayExponent)} e-folds</dd></div>
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Dry thickness (wet × solids)</dt><dd>{formatInSystem(massBalance.expectedDryThickness, 'length', system)}</dd></div>
          <div className="flex justify-between gap-2"><dt className="text-ink-soft">Solvent left at exit</dt><dd>{sig(massBalance.exitSolventFraction * 100)} vol %</dd></div>
        </dl>
      </section>

      {events.length > 0 && (
        <section aria-labelledby="drying-events">
          <h2 id="drying-events" className="mb-2 font-semibold text-ink">Events along the path</h2>
          <ol className="flex flex-col gap-1 text-sm">
            {events.map((e, i) => (
              <li key={i} className="flex gap-3">
                <span className="w-28 shrink-0 font-semibold">{eventWords[e.kind]}</span>
                <span className="w-36 shrink-0 text-ink-soft">
                  {sig(e.time)} s{e.position !== null ? `, ${sig(e.position)} m` : ''}
                </span>
                <span>{e.detail}</span>
              </li>
            ))}
          </ol>
        </section>
      )}

      <section aria-labelledby="drying-zones">
        <h2 id="drying-zones" className="mb-2 font-semibold text-ink">Zone by zone</h2>
        <div className="overflow-x-auto rounded-md border border-slate-line bg-paper-raised">
          <table className="w-full text-sm">
            <thead className="bg-paper-sunk text-left text-ink-soft">
              <tr>
                <th className="px-3 py-2 font-medium">Zone</th>
                <th className="px-3 py-2 text-right font-medium">Time</th>
                <th className="px-3 py-2 text-right font-medium">Thickness out</th>
                <th className="px-3 py-2 text-right font-medium">Solids out</th>
                <th className="px-3 py-2 text-right font-medium">Peak film T</th>
                <th className="px-3 py-2 text-right font-medium">Smallest margin</th>
                <th className="px-3 py-2 text-right font-medium">Solvent evaporated</th>
                <th className="px-3 py-2 text-right font-medium">Fresh air for ≤ {lflPercent} % LFL</th>
              </tr>
            </thead>
            <tbody>
              {answer.zones.map((z) => (
                <tr key={z.index} className="border-t border-slate-line">
                  <td className="whitespace-nowrap px-3 py-2 font-medium">{z.name}</td>
                  <td className="whitespace-nowrap px-3 py-2 text-right">{sig(z.residenceTime)} s</td>
                  <td className="whitespace-nowrap px-3 py-2 text-right">{formatInSystem(z.thicknessOut, 'length', system, 3)}</td>
                  <td className="whitespace-nowrap px-3 py-2 text-right">{sig(z.solidsOut * 100)} %</td>
                  <td className="whitespace-nowrap px-3 py-2 text-right">{formatInSystem(z.maxFilmTemperature, 'temperature', system, 3)}</td>
                  <td className="whitespace-nowrap px-3 py-2 text-right">{sig(Math.min(z.minSolutalMargin ?? Infinity, z.minThermalMargin ?? Infinity))} ×</td>
                  <td className="whitespace-nowrap px-3 py-2 text-right">{z.solventLitresPerMinute === null ? '— (no width)' : `${sig(z.solventLitresPerMinute)} L/min`}</td>
                  <td className="whitespace-nowrap px-3 py-2 text-right font-semibold">{z.ventilation ? `≥ ${sig(z.ventilation.freshAirRequired * 60)} m³/min` : '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <Notice tone="caution" title="Caution: solvent vapour and ventilation">
        <p>
          The fresh air shown keeps each zone's exhaust at or below {lflPercent} % of the lower flammable limit at the <em>modelled</em> solvent load
          {lflPercent === 50 ? ' (50 % is allowed only with continuous solvent-vapour monitoring and control)' : ' (up to 50 % only with continuous solvent-vapour monitoring and control)'}.
          Size ventilation at the maximum solvent load, never bypass the purge or interlocks, and confirm with NFPA 86 / EN 1539 and your authority having jurisdiction.
        </p>
        <ul className="mt-2 list-disc pl-5">
          {answer.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
        <p className="mt-2 font-semibold">{answer.closingLine}</p>
      </Notice>

      {answer.warnings.length > 0 && (
        <Notice tone="info" title="Notes on this path">
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
