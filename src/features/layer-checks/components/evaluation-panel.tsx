import type { ReactNode } from 'react';
import type { LayerEvaluation, Lever } from '../../../../shared/schemas/layer-checks';
import type { QuantityKind } from '../../../../shared/units/quantity-kinds';
import { Notice } from '../../../components/ui/notice';
import { formatInSystem, formatNumber, type UnitSystem } from '../../../lib/unit-system';
import { cn } from '../../../utils/cn';
import { CellPreview } from './cell-preview';
import { MarginGauge } from './margin-gauge';
import { marginStatusStyle } from './margin-status';

interface EvaluationPanelProps {
  evaluation: LayerEvaluation;
  system: UnitSystem;
  panelWidth: number | null;
  /** True while a newer evaluation is on its way (the figures shown are for the previous input). */
  stale: boolean;
}

function Section({ title, children, className, testId }: { title: string; children: ReactNode; className?: string; testId?: string }) {
  return (
    <section className={cn('rounded-md border border-slate-line bg-paper-raised p-4', className)} data-testid={testId}>
      <h3 className="mb-2 font-semibold text-ink">{title}</h3>
      {children}
    </section>
  );
}

/** Label / value rows; values right-aligned in tabular figures. */
function Rows({ rows }: { rows: [ReactNode, ReactNode, string?][] }) {
  return (
    <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 gap-y-1 text-[0.95rem]">
      {rows.map(([label, value, testId], index) => (
        <div key={index} className="contents">
          <dt className="text-ink-soft">{label}</dt>
          <dd className="text-right font-medium whitespace-nowrap tabular-nums" data-testid={testId}>
            {value}
          </dd>
        </div>
      ))}
    </dl>
  );
}

const leverKind: Record<Lever['lever'], QuantityKind> = {
  'wet-thickness': 'length',
  'temperature-difference': 'temperatureDifference',
  viscosity: 'dynamicViscosity',
};
const leverName: Record<Lever['lever'], string> = {
  'wet-thickness': 'Wet thickness',
  'temperature-difference': 'Temperature difference',
  viscosity: 'Viscosity',
};

/** "0.0897" → "0.0897×"; no onset → "No onset". */
export function formatMargin(margin: number | null): string {
  return margin === null ? 'No onset' : `${formatNumber(margin, 3)}×`;
}

/**
 * Everything the evaluation says, in the order a process engineer reads it: the margin and its
 * word, the regime and why, the cells, the sizing answers, what defect to expect and which lever
 * moves it, then the groups and critical values, warnings and cautions.
 */
export function EvaluationPanel({ evaluation: e, system, panelWidth, stale }: EvaluationPanelProps) {
  const style = marginStatusStyle[e.status];
  const q = (si: number | null | undefined, kind: QuantityKind, digits = 4) => formatInSystem(si, kind, system, digits);
  const cellsFromLongWave = e.regime === 'long-wave-thinning';

  return (
    <div className={cn('flex flex-col gap-4 transition-opacity', stale && 'opacity-60')} aria-busy={stale || undefined} data-testid="evaluation">
      <section className={cn('flex flex-wrap items-center gap-x-6 gap-y-2 rounded-md border-2 p-4', style.tint)} aria-label="Onset margin" data-testid="margin-hero">
        <div className="flex min-w-0 flex-col">
          <span className="text-sm font-semibold text-ink-soft">Onset margin</span>
          <span className="text-6xl leading-none font-bold tracking-tight text-ink tabular-nums" data-testid="margin-value">
            {formatMargin(e.margin)}
          </span>
          <span className={cn('mt-2 flex items-center gap-2 text-2xl font-bold', style.text)} data-testid="margin-word">
            <span aria-hidden="true">{style.mark}</span>
            {style.word}
          </span>
          <span className="mt-1 text-sm text-ink-soft">
            Quiet ≥ {formatNumber(e.alertThreshold, 3)} · Close 1–{formatNumber(e.alertThreshold, 3)} · Over &lt; 1
          </span>
        </div>
        <MarginGauge margin={e.margin} threshold={e.alertThreshold} />
      </section>

      <Section title="What the layer does" testId="regime">
        <p className="text-lg font-semibold" data-testid="regime-label">
          {e.regimeLabel}
        </p>
        <p className="mt-1">{e.mechanismSentence}</p>
        {e.regime === 'quiet' && e.margin !== null && <p className="mt-1 text-ink-soft">If it were pushed past onset: {e.mechanismLabel.toLowerCase()}.</p>}
        {e.buoyancyShare !== null && (
          <p className="mt-1 text-sm text-ink-soft">
            Share of the drive at onset: buoyancy {formatNumber(100 * e.buoyancyShare, 3)} %, surface tension {formatNumber(100 * (1 - e.buoyancyShare), 3)} %.
          </p>
        )}
      </Section>

      {e.solutal && (
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2" data-testid="drives">
          <Section title={`Thermal drive${e.solutal.dominant === 'thermal' ? ' (nearer onset)' : ''}`}>
            <Rows
              rows={[
                ['Marangoni Ma', formatNumber(e.groups.marangoni)],
                ['Critical Ma', formatNumber(e.critical.marangoniAlone)],
                ['Margin', formatMargin(e.margin)],
              ]}
            />
          </Section>
          <Section title={`Solutal drive${e.solutal.dominant === 'solutal' ? ' (nearer onset)' : ''}`}>
            <Rows
              rows={[
                ['Solutal Ma', formatNumber(e.solutal.marangoni)],
                ['Critical Ma', formatNumber(e.solutal.critical)],
                ['Margin', formatMargin(e.solutal.margin)],
              ]}
            />
          </Section>
        </div>
      )}

      {e.warnings.length > 0 && (
        <div className="flex flex-col gap-2" data-testid="warnings">
          {e.warnings.map((warning) => (
            <Notice key={warning.code} tone="caution" title="Check this">
              {warning.message}
            </Notice>
          ))}
        </div>
      )}

      <div className="grid grid-cols-1 gap-4 xl:grid-cols-2">
        <Section title="Cells" testId="cells">
          <Rows
            rows={[
              ['Critical wavenumber k_c', e.critical.wavenumber === null ? '—' : `${formatNumber(e.critical.wavenumber)} / d`],
              ['Wavelength 2πd/k_c', cellsFromLongWave ? 'very long' : q(e.cells.wavelength, 'length')],
              ['Hexagon spacing', cellsFromLongWave ? 'very long' : q(e.cells.hexagonSpacing, 'length'), 'hexagon-spacing'],
              ['Cells across the panel', e.cells.acrossPanel === null ? '—' : formatNumber(e.cells.acrossPanel, 3)],
            ]}
          />
        </Section>
        <Section title="Sizing answers" testId="sizing">
          <Rows
            rows={[
              ['Largest quiet depth at this heating', e.sizing.maxStableDepth === null ? 'no limit' : q(e.sizing.maxStableDepth, 'length')],
              ['Smallest quiet depth (long-wave below)', e.sizing.minStableDepth === null ? 'none' : q(e.sizing.minStableDepth, 'length')],
              ['Largest quiet ΔT at this depth', e.sizing.maxDeltaT === null ? 'no limit' : q(e.sizing.maxDeltaT, 'temperatureDifference')],
              ['Operating ΔT across the layer', q(e.operatingPoint.deltaT, 'temperatureDifference')],
              ...(e.operatingPoint.heatFlux !== null ? ([['Heat flux through the layer', q(e.operatingPoint.heatFlux, 'heatFlux')]] as [string, string][]) : []),
            ]}
          />
        </Section>
      </div>

      <Section title="Cell preview" testId="cell-preview-section">
        <CellPreview evaluation={e} panelWidth={panelWidth} system={system} />
      </Section>

      {(e.defects.length > 0 || e.levers.length > 0) && (
        <Section title="What to expect on the line, and the levers" testId="defects">
          {e.defects.length > 0 && (
            <ul className="flex flex-col gap-1.5">
              {e.defects.map((defect) => (
                <li key={defect.name}>
                  <span className="font-semibold">{defect.name}</span>: {defect.description}
                </li>
              ))}
            </ul>
          )}
          {e.levers.length > 0 && (
            <>
              <h4 className="mt-3 mb-1 text-sm font-semibold text-ink-soft">How far each lever must move (one at a time) to reach margin {formatNumber(e.alertThreshold, 3)}</h4>
              <table className="w-full text-left text-[0.95rem]">
                <caption className="sr-only">Levers</caption>
                <thead>
                  <tr className="border-b border-slate-line text-sm text-ink-soft">
                    <th scope="col" className="py-1 pr-2 font-semibold">Lever</th>
                    <th scope="col" className="py-1 pr-2 text-right font-semibold">Now</th>
                    <th scope="col" className="py-1 pr-2 text-right font-semibold">Target</th>
                    <th scope="col" className="py-1 text-right font-semibold">Change</th>
                  </tr>
                </thead>
                <tbody>
                  {e.levers.map((lever) => (
                    <tr key={lever.lever} className="border-b border-slate-line/60 align-top">
                      <th scope="row" className="py-1.5 pr-2 font-medium">
                        {leverName[lever.lever]}
                        <p className="text-sm font-normal text-ink-soft">{lever.text}</p>
                      </th>
                      <td className="py-1.5 pr-2 text-right whitespace-nowrap tabular-nums">{q(lever.present, leverKind[lever.lever], 3)}</td>
                      <td className="py-1.5 pr-2 text-right whitespace-nowrap tabular-nums">{lever.target === null ? 'out of reach' : q(lever.target, leverKind[lever.lever], 3)}</td>
                      <td className="py-1.5 text-right whitespace-nowrap tabular-nums">
                        {lever.factor === null ? '—' : lever.direction === 'hold' ? 'hold' : `×${formatNumber(lever.factor, 3)}`}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </>
          )}
        </Section>
      )}

      {e.lateralFlow && (
        <Section title="Flow along the layer" testId="lateral-flow">
          <p>{e.lateralFlow.text}</p>
          <Rows
            rows={[
              ['Surface stress |dσ/dT|·ΔT/L', `${formatNumber(e.lateralFlow.surfaceStress)} Pa`],
              ['Surface speed, closed layer (return flow)', q(e.lateralFlow.closedLayerSpeed, 'speed', 3)],
              ['Surface speed, liquid free to leave', q(e.lateralFlow.openLayerSpeed, 'speed', 3)],
              ['Direction', e.lateralFlow.direction === 'toward-cooler' ? 'toward the cooler side' : 'toward the hotter side'],
            ]}
          />
        </Section>
      )}

      <div className="grid grid-cols-1 gap-4 xl:grid-cols-2">
        <Section title="Dimensionless groups" testId="groups">
          <Rows
            rows={[
              ['Rayleigh Ra', formatNumber(e.groups.rayleigh), 'group-rayleigh'],
              ['Marangoni Ma', formatNumber(e.groups.marangoni), 'group-marangoni'],
              ['Biot Bi', e.groups.biot === null ? '∞' : formatNumber(e.groups.biot)],
              ['Prandtl Pr', formatNumber(e.groups.prandtl)],
              ['Bond Bo', formatNumber(e.groups.bond)],
              ['Dynamic Bond Ra/Ma', formatNumber(e.groups.dynamicBond)],
              ['Crispation Cr', formatNumber(e.groups.crispation)],
              ['Galileo Ga', formatNumber(e.groups.galileo)],
              ...(e.groups.solutalMarangoni !== null ? ([['Solutal Marangoni', formatNumber(e.groups.solutalMarangoni)]] as [string, string][]) : []),
              ['Capillary length', q(e.groups.capillaryLength, 'length')],
            ]}
          />
        </Section>
        <Section title="Critical values" testId="critical">
          <Rows
            rows={[
              ['Ra at onset (this ratio of drives)', formatNumber(e.critical.rayleigh)],
              ['Ma at onset (this ratio of drives)', formatNumber(e.critical.marangoni)],
              ['Critical Ra, buoyancy alone', formatNumber(e.critical.rayleighAlone)],
              ['Critical Ma, surface tension alone', formatNumber(e.critical.marangoniAlone)],
              ['Wavenumber k_c', e.critical.wavenumber === null ? '—' : `${formatNumber(e.critical.wavenumber)} / d`],
            ]}
          />
          <h4 className="mt-3 mb-1 text-sm font-semibold text-ink-soft">Properties at {q(e.operatingPoint.temperature, 'temperature')}</h4>
          <Rows
            rows={[
              ['Density ρ', q(e.properties.density, 'density')],
              ['Viscosity μ', q(e.properties.viscosity, 'dynamicViscosity')],
              ['Surface tension σ', q(e.properties.surfaceTension, 'surfaceTension')],
              ['dσ/dT', q(e.properties.surfaceTensionSlope, 'surfaceTensionSlope')],
              ['Conductivity k', q(e.properties.conductivity, 'conductivity')],
              ['Thermal diffusivity κ', q(e.properties.thermalDiffusivity, 'diffusivity')],
            ]}
          />
        </Section>
      </div>
    </div>
  );
}

/** The process kind's cautions, ending with the sentence that local codes and qualified practice govern. */
export function CautionsPanel({ cautions, closingLine }: { cautions: string[]; closingLine: string }) {
  return (
    <section aria-labelledby="cautions-title" className="rounded-md border border-close/50 bg-close-light/50 p-4" data-testid="cautions">
      <h2 id="cautions-title" className="flex items-center gap-2 font-semibold">
        <span aria-hidden="true">▲</span> Cautions for this process
      </h2>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
      <p className="mt-3 font-semibold" data-testid="closing-line">
        {closingLine}
      </p>
    </section>
  );
}
