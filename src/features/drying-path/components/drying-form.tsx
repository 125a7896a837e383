import type { FormEvent, ReactNode } from 'react';
import type { QuantityKind } from '../../../../shared/units/quantity-kinds';
import { QuantityField } from '../../../components/units/quantity-field';
import { Button } from '../../../components/ui/button';
import { Field, Select, TextField } from '../../../components/ui/field';
import { apiPathOf, type DryingFormValues, type ZoneValues } from './drying-form-values';

interface DryingFormProps {
  values: DryingFormValues;
  errors: Record<string, string>;
  busy: boolean;
  onChange: (values: DryingFormValues) => void;
  onSubmit: () => void;
}

type TextKey = { [K in keyof DryingFormValues]: DryingFormValues[K] extends string ? K : never }[keyof DryingFormValues];

function Section({ title, children, open = true }: { title: string; children: ReactNode; open?: boolean }) {
  return (
    <details open={open} className="rounded-md border border-slate-line bg-paper-raised">
      <summary className="cursor-pointer px-4 py-2 font-semibold text-ink">{title}</summary>
      <div className="grid gap-3 px-4 pb-4 sm:grid-cols-2">{children}</div>
    </details>
  );
}

/** The Drying path inputs: film, line and oven zones, solvent, viscosity law, film and air properties. */
export function DryingForm({ values, errors, busy, onChange, onSubmit }: DryingFormProps) {
  const set = <K extends keyof DryingFormValues>(key: K, value: DryingFormValues[K]) => onChange({ ...values, [key]: value });
  const err = (key: string) => errors[apiPathOf[key] ?? key];
  const quantity = (key: TextKey, label: string, kinds: QuantityKind[], hint?: string) => (
    <QuantityField key={key} label={label} kinds={kinds} value={values[key]} error={err(key)} hint={hint} onChange={(text) => set(key, text)} />
  );
  const plain = (key: TextKey, label: string, hint?: string) => (
    <TextField key={key} label={label} value={values[key]} error={err(key)} hint={hint} inputMode="decimal" onChange={(e) => set(key, e.target.value)} />
  );
  const setZone = (index: number, patch: Partial<ZoneValues>) => set('zones', values.zones.map((z, i) => (i === index ? { ...z, ...patch } : z)));
  const line = values.transport === 'line';
  const zoneError = (index: number, field: string) => errors[`oven.zones.${index}.${field}`];

  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSubmit();
  };

  return (
    <form onSubmit={submit} className="flex flex-col gap-4" aria-label="Drying path inputs">
      <Section title="Wet film and line">
        {quantity('wetThickness', 'Wet thickness', ['length'])}
        {plain('solidsFraction', 'Volume solids', 'a fraction (0.35) or a percentage (35 %)')}
        <Field label="Oven transport">
          {({ id }) => (
            <Select id={id} value={values.transport} onChange={(e) => set('transport', e.target.value as DryingFormValues['transport'])}>
              <option value="line">Line speed and zone lengths</option>
              <option value="schedule">Seconds per zone</option>
            </Select>
          )}
        </Field>
        {line && quantity('lineSpeed', 'Line speed', ['speed'])}
        {line && quantity('webWidth', 'Coated width', ['length'], 'needed for the solvent load and fresh air per zone')}
        <Field label="Solvent-vapour monitoring">
          {({ id }) => (
            <label htmlFor={id} className="flex min-h-11 items-center gap-2 text-ink">
              <input id={id} type="checkbox" className="size-5" checked={values.continuousSolventMonitoring} onChange={(e) => set('continuousSolventMonitoring', e.target.checked)} />
              Continuous monitoring and control installed (50 % LFL)
            </label>
          )}
        </Field>
      </Section>

      <fieldset className="min-w-0 rounded-md border border-slate-line bg-paper-raised px-4 pb-4">
        <legend className="px-1 font-semibold text-ink">Oven zones</legend>
        <div className="overflow-x-auto">
          <table className="w-full min-w-[36rem] text-sm">
            <thead>
              <tr className="text-left text-ink-soft">
                <th className="py-1 pr-2 font-medium">Zone</th>
                <th className="py-1 pr-2 font-medium">{line ? 'Length' : 'Time [s]'}</th>
                <th className="py-1 pr-2 font-medium">Air temperature</th>
                <th className="py-1 pr-2 font-medium">h, coated face</th>
                <th className="py-1 pr-2 font-medium">h, back face</th>
                <th className="py-1 font-medium"><span className="sr-only">Remove</span></th>
              </tr>
            </thead>
            <tbody>
              {values.zones.map((zone, i) => {
                const cell = (field: keyof ZoneValues, label: string, apiField = field) => (
                  <td className="py-1 pr-2 align-top">
                    <input
                      aria-label={`${label}, zone ${i + 1}`}
                      aria-invalid={Boolean(zoneError(i, apiField))}
                      className="block min-h-10 w-full rounded-md border border-slate-line bg-paper-raised px-2 aria-[invalid=true]:border-over"
                      value={zone[field]}
                      onChange={(e) => setZone(i, { [field]: e.target.value })}
                    />
                    {zoneError(i, apiField) && <p className="mt-0.5 text-xs font-medium text-over">✕ {zoneError(i, apiField)}</p>}
                  </td>
                );
                return (
                  <tr key={i} className="border-t border-slate-line">
                    {cell('name', 'Name')}
                    {line ? cell('length', 'Length') : cell('duration', 'Time in zone')}
                    {cell('airTemperature', 'Air temperature')}
                    {cell('heatTransferCoefficient', 'Heat-transfer coefficient, coated face')}
                    {cell('backHeatTransferCoefficient', 'Heat-transfer coefficient, back face')}
                    <td className="py-1 align-top">
                      <Button variant="quiet" size="sm" disabled={values.zones.length <= 1} onClick={() => set('zones', values.zones.filter((_, j) => j !== i))} aria-label={`Remove zone ${i + 1}`}>
                        Remove
                      </Button>
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
        {errors['oven.zones'] && <p className="text-sm font-medium text-over">✕ {errors['oven.zones']}</p>}
        <Button
          variant="secondary"
          size="sm"
          className="mt-2"
          disabled={values.zones.length >= 20}
          onClick={() => {
            const last = values.zones.at(-1);
            set('zones', [...values.zones, { ...(last as ZoneValues), name: `Zone ${values.zones.length + 1}` }]);
          }}
        >
          Add a zone
        </Button>
      </fieldset>

      <Section title="Solvent">
        {plain('solventName', 'Name')}
        {plain('lowerFlammableLimit', 'Lower flammable limit', 'vol %, e.g. 1.1 % (correct it to oven temperature)')}
        {quantity('solventDensity', 'Liquid density', ['density'])}
        {quantity('latentHeat', 'Latent heat', ['latentHeat'])}
        {plain('molarMass', 'Molar mass', 'e.g. 92.14 g/mol')}
        <Field label="Evaporation">
          {({ id }) => (
            <Select id={id} value={values.volatility} onChange={(e) => set('volatility', e.target.value as DryingFormValues['volatility'])}>
              <option value="antoine">Antoine vapour pressure</option>
              <option value="fixed-rate">Fixed evaporation rate</option>
            </Select>
          )}
        </Field>
        {values.volatility === 'antoine' ? (
          <>
            {plain('antoineA', 'Antoine A', 'log₁₀(p/bar) = A − B/(T/K + C)')}
            {plain('antoineB', 'Antoine B [K]')}
            {plain('antoineC', 'Antoine C [K]')}
            {quantity('vapourDiffusivityInAir', 'Vapour diffusivity in air', ['diffusivity'])}
          </>
        ) : (
          quantity('evaporationRate', 'Evaporation rate (pure solvent)', ['massFlux'])
        )}
        {quantity('diffusivity', 'Diffusivity in the wet film, D₀', ['diffusivity'])}
        {plain('diffusivitySolidsExponent', 'Fall of D with solids, b in D₀·exp(−bφ)')}
      </Section>

      <Section title="Viscosity against solids">
        <Field label="Viscosity law">
          {({ id }) => (
            <Select id={id} value={values.viscosityKind} onChange={(e) => set('viscosityKind', e.target.value as DryingFormValues['viscosityKind'])}>
              <option value="exponential">Exponential (Arrhenius 1887)</option>
              <option value="krieger-dougherty">Krieger–Dougherty (1959)</option>
            </Select>
          )}
        </Field>
        {quantity('solventViscosity', 'Solvent viscosity μ_s', ['dynamicViscosity'])}
        {values.viscosityKind === 'exponential' ? (
          plain('viscosityExponent', 'Exponent B')
        ) : (
          <>
            {plain('intrinsicViscosity', 'Intrinsic viscosity [η]', '2.5 for hard spheres')}
            {plain('maxPackingFraction', 'Maximum packing φ_m', 'about 64 % for random close packing')}
          </>
        )}
      </Section>

      <Section title="Film, substrate and air" open={false}>
        {quantity('filmDensity', 'Film density', ['density'])}
        {quantity('filmHeatCapacity', 'Film heat capacity', ['heatCapacity'])}
        {quantity('filmConductivity', 'Film conductivity', ['conductivity'])}
        {quantity('filmExpansion', 'Film expansion', ['expansion'])}
        {quantity('filmSurfaceTension', 'Surface tension', ['surfaceTension'])}
        {quantity('filmSurfaceTensionSlope', 'dσ/dT', ['surfaceTensionSlope'])}
        {quantity('filmConcentrationSlope', 'dσ/dψ (per solvent volume fraction)', ['surfaceTension'])}
        <Field label="Substrate">
          {({ id }) => (
            <Select id={id} value={values.substrateKind} onChange={(e) => set('substrateKind', e.target.value as DryingFormValues['substrateKind'])}>
              <option value="thermal-mass">Web with thermal mass</option>
              <option value="held">Held at a temperature</option>
            </Select>
          )}
        </Field>
        {values.substrateKind === 'thermal-mass' && plain('arealHeatCapacity', 'Web ρc × thickness [J/(m²·K)]')}
        {quantity('substrateTemperature', values.substrateKind === 'thermal-mass' ? 'Web entry temperature' : 'Substrate temperature', ['temperature'])}
        {quantity('airDensity', 'Air density', ['density'])}
        {quantity('airHeatCapacity', 'Air heat capacity', ['heatCapacity'])}
        {quantity('airThermalDiffusivity', 'Air thermal diffusivity', ['diffusivity'])}
      </Section>

      <div className="no-print">
        <Button type="submit" busy={busy}>
          Compute the drying path
        </Button>
      </div>
    </form>
  );
}
