import type { Fluid, Property } from '../../../../shared/schemas/fluids';
import { formatInSystem, type UnitSystem } from '../../../lib/unit-system';
import { propertyRows } from './fluid-form-values';

/** The stored fluid at its reference temperature, in the person's units, each value with its source and ± %. */
export function FluidSummary({ fluid, system }: { fluid: Fluid; system: UnitSystem }) {
  const viscosityAtReference = fluid.viscosity.fitPreExponential * Math.exp(fluid.viscosity.fitActivationTemperature / fluid.referenceTemperature.si);
  const rows: { label: string; value: string; property: Pick<Property, 'source' | 'uncertaintyPercent' | 'distribution'> }[] = [];
  for (const row of propertyRows) {
    const property = fluid[row.key];
    if (!property) continue;
    rows.push({ label: row.label, value: formatInSystem(property.si, row.kinds[0]!, system), property });
    if (row.key === 'expansion') {
      rows.push({ label: 'Viscosity μ at T₀', value: formatInSystem(viscosityAtReference, 'dynamicViscosity', system), property: fluid.viscosity });
    }
  }
  return (
    <section aria-labelledby="fluid-summary-title" className="rounded-md border border-slate-line bg-paper-raised p-4" data-testid="fluid-summary">
      <h2 id="fluid-summary-title" className="font-semibold">
        Stored values at T₀ = {formatInSystem(fluid.referenceTemperature.si, 'temperature', system)}
      </h2>
      <p className="text-sm text-ink-soft">
        In your units. Valid {fluid.validFrom ? formatInSystem(fluid.validFrom.si, 'temperature', system) : '—'} to{' '}
        {fluid.validTo ? formatInSystem(fluid.validTo.si, 'temperature', system) : '—'}
        {fluid.viscosity.law === 'points' && fluid.viscosity.fitActivationTemperature !== 0 && (
          <> · viscosity law μ = A·exp(B/T), B = {formatInSystem(fluid.viscosity.fitActivationTemperature, 'temperatureDifference', 'si')}, fit misfit {(100 * fluid.viscosity.fitRmsRelativeError).toPrecision(2)} % rms</>
        )}
      </p>
      <dl className="mt-3 grid grid-cols-1 gap-x-6 gap-y-2 text-sm md:grid-cols-2">
        {rows.map((row) => (
          <div key={row.label} className="flex flex-col border-b border-slate-line/60 pb-1.5">
            <dt className="text-ink-soft">{row.label}</dt>
            <dd className="flex flex-wrap items-baseline gap-x-2">
              <span className="font-semibold tabular-nums text-ink">{row.value}</span>
              <span className="tabular-nums text-ink-soft">
                ± {row.property.uncertaintyPercent} % {row.property.distribution}
              </span>
              <span className="basis-full text-xs text-ink-soft">{row.property.source || 'No source given'}</span>
            </dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
