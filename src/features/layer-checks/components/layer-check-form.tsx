import { Controller, useWatch, type UseFormReturn } from 'react-hook-form';
import { processKindPresets } from '../../../../shared/fluids/process-kind-presets';
import { processKindLabels, processKindValues, type HeatingMode, type ProcessKind } from '../../../../shared/schemas/layer-checks';
import type { QuantityKind } from '../../../../shared/units/quantity-kinds';
import { Field, Select, TextField } from '../../../components/ui/field';
import { QuantityField } from '../../../components/units/quantity-field';
import { applyProcessKindPreset, type LayerCheckField, type LayerCheckFormValues } from './layer-check-form-values';

export interface FluidOption {
  id: string;
  name: string;
  archived?: boolean;
}

const heatingModeLabels: Record<HeatingMode, string> = {
  deltaT: 'Temperature difference across the layer',
  'substrate-air': 'Substrate and air temperatures with h',
  'heat-flux': 'Heat flux through the layer',
  evaporation: 'Evaporation load',
};

interface LayerCheckFormProps {
  form: UseFormReturn<LayerCheckFormValues>;
  fluids: FluidOption[];
  readOnly: boolean;
  /** Server messages by form field (from the live evaluation or a refused save). */
  serverErrors: Partial<Record<LayerCheckField, string>>;
}

/**
 * The check's inputs. A process kind sets sensible boundaries and shows only the inputs that
 * matter for it; every quantity is typed with its unit and read live beside the box.
 */
export function LayerCheckForm({ form, fluids, readOnly, serverErrors }: LayerCheckFormProps) {
  const { control, register, getValues, reset, formState } = form;
  const [processKind, heatingMode, top, lateralOn] = useWatch({ control, name: ['processKind', 'heatingMode', 'top', 'lateralOn'] });
  const preset = processKindPresets[processKind];
  const modes = preset.heatingModes.includes(heatingMode) ? preset.heatingModes : [heatingMode, ...preset.heatingModes];
  const errorOf = (name: LayerCheckField) => (formState.errors[name]?.message as string | undefined) ?? serverErrors[name];

  const quantity = (name: LayerCheckField, label: string, kinds: readonly QuantityKind[], placeholder: string, hint?: string) => (
    <Controller
      key={name}
      control={control}
      name={name}
      render={({ field }) => (
        <QuantityField
          label={label}
          kinds={kinds}
          value={String(field.value ?? '')}
          name={field.name}
          inputRef={field.ref}
          onChange={field.onChange}
          onBlur={field.onBlur}
          placeholder={placeholder}
          hint={hint}
          readOnly={readOnly}
          error={errorOf(name)}
        />
      )}
    />
  );

  const changeKind = (kind: ProcessKind) => {
    reset(applyProcessKindPreset(getValues(), kind), { keepDefaultValues: true, keepDirty: true });
  };

  return (
    <fieldset disabled={readOnly} className="flex min-w-0 flex-col gap-5" data-testid="layer-check-form">
      <legend className="sr-only">Layer check inputs</legend>
      <TextField label="Title" error={errorOf('title')} placeholder="e.g. Line 2 primer, first zone" {...register('title')} />

      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <Field label="Process kind" error={errorOf('processKind')} hint={preset.note}>
          {({ id, describedBy }) => (
            <Select id={id} aria-describedby={describedBy} value={processKind} onChange={(event) => changeKind(event.target.value as ProcessKind)}>
              {processKindValues.map((kind) => (
                <option key={kind} value={kind}>
                  {processKindLabels[kind]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Fluid" error={errorOf('fluidId')} hint={fluids.length === 0 ? 'The fluid library is empty: add a fluid first.' : undefined}>
          {({ id, describedBy, invalid }) => (
            <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} {...register('fluidId')}>
              <option value="">Choose a fluid…</option>
              {fluids.map((fluid) => (
                <option key={fluid.id} value={fluid.id}>
                  {fluid.name}
                  {fluid.archived ? ' (archived)' : ''}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>

      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        {quantity('temperature', 'Evaluation temperature', ['temperature'], 'e.g. 60 °C or 140 °F', 'Properties are taken at this temperature.')}
        {quantity('depth', 'Layer depth (wet thickness)', ['length'], 'e.g. 50 µm or 2 mil')}
      </div>

      <fieldset className="grid grid-cols-1 gap-4 rounded-md border border-slate-line/70 p-3 sm:grid-cols-2">
        <legend className="px-1 text-sm font-semibold">Boundaries</legend>
        <Field label="Bottom" error={errorOf('bottomMechanics')}>
          {({ id }) => (
            <Select id={id} {...register('bottomMechanics')}>
              <option value="rigid">Rigid substrate</option>
              <option value="free">Free (liquid)</option>
            </Select>
          )}
        </Field>
        <Field label="Bottom heat" error={errorOf('bottomThermal')}>
          {({ id }) => (
            <Select id={id} {...register('bottomThermal')}>
              <option value="conducting">Conducting</option>
              <option value="insulating">Insulating</option>
            </Select>
          )}
        </Field>
        <Field label="Top" error={errorOf('top')}>
          {({ id }) => (
            <Select id={id} {...register('top')}>
              <option value="surface">Free surface to air</option>
              <option value="rigid">Rigid lid</option>
              <option value="free">Flat, stress-free</option>
            </Select>
          )}
        </Field>
        {top === 'surface' && (
          <label className="flex min-h-11 items-center gap-2 text-sm sm:col-span-2">
            <input type="checkbox" className="size-5" {...register('deformableSurface')} />
            The surface may deform (check long-wave thinning into dry spots)
          </label>
        )}
      </fieldset>

      <fieldset className="flex flex-col gap-4 rounded-md border border-slate-line/70 p-3">
        <legend className="px-1 text-sm font-semibold">Heating</legend>
        <Field label="Heat is given as" error={errorOf('heatingMode')}>
          {({ id }) => (
            <Select id={id} {...register('heatingMode')}>
              {modes.map((mode) => (
                <option key={mode} value={mode}>
                  {heatingModeLabels[mode]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          {heatingMode === 'deltaT' && [
            quantity('deltaT', 'ΔT bottom → surface', ['temperatureDifference'], 'e.g. 5 K or 9 °F', 'A difference: 1 K = 1.8 °F.'),
            quantity('heatTransferCoefficient', 'Top heat-transfer coefficient h (optional)', ['heatTransferCoefficient'], 'e.g. 25 W/(m²·K)', 'Sets the Biot number; blank = insulating top.'),
          ]}
          {heatingMode === 'substrate-air' && [
            quantity('substrateTemperature', 'Substrate temperature', ['temperature'], 'e.g. 45 °C'),
            quantity('airTemperature', 'Air temperature', ['temperature'], 'e.g. 80 °C'),
            quantity('heatTransferCoefficient', 'Air-side heat-transfer coefficient h', ['heatTransferCoefficient'], 'e.g. 25 W/(m²·K)'),
          ]}
          {heatingMode === 'heat-flux' && [
            quantity('heatFlux', 'Heat flux q', ['heatFlux'], 'e.g. 1 kW/m²'),
            quantity('heatTransferCoefficient', 'Top heat-transfer coefficient h (optional)', ['heatTransferCoefficient'], 'e.g. 25 W/(m²·K)'),
          ]}
          {heatingMode === 'evaporation' && [
            quantity('evaporationRate', 'Evaporation rate', ['massFlux'], 'e.g. 1 g/(m²·s)'),
            quantity('latentHeat', 'Latent heat of the solvent', ['latentHeat'], 'e.g. 850 kJ/kg'),
            quantity('heatTransferCoefficient', 'Top heat-transfer coefficient h (optional)', ['heatTransferCoefficient'], 'e.g. 25 W/(m²·K)'),
          ]}
        </div>
      </fieldset>

      {(preset.showLateral || preset.showPanelWidth || preset.showSolute) && (
        <fieldset className="flex flex-col gap-4 rounded-md border border-slate-line/70 p-3">
          <legend className="px-1 text-sm font-semibold">Along the layer</legend>
          {preset.showLateral && (
            <>
              <label className="flex min-h-11 items-center gap-2 text-sm">
                <input type="checkbox" className="size-5" {...register('lateralOn')} />
                A temperature difference runs along the layer (edge, zone boundary, pool radius)
              </label>
              {lateralOn && (
                <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
                  {quantity('lateralDeltaT', 'Lateral ΔT', ['temperatureDifference'], 'e.g. 3 K')}
                  {quantity('lateralDistance', 'Over a distance of', ['length'], 'e.g. 50 mm')}
                </div>
              )}
            </>
          )}
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            {preset.showPanelWidth && quantity('panelWidth', 'Panel or web width (optional)', ['length'], 'e.g. 600 mm', 'For the number of cells across.')}
            {preset.showSolute && (
              <TextField
                label="Solvent fraction difference Δc (optional)"
                inputMode="decimal"
                placeholder="e.g. 0.05"
                hint="Mass fraction, 0 to 1, across the layer; with dσ/dc it gives the solutal drive."
                error={errorOf('soluteFractionDifference')}
                {...register('soluteFractionDifference')}
              />
            )}
          </div>
        </fieldset>
      )}

      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <TextField
          label="Alert threshold (margin)"
          inputMode="decimal"
          hint="Below this margin the check reads Close; below 1, Over."
          error={errorOf('alertThreshold')}
          {...register('alertThreshold')}
        />
      </div>
      <Field label="Notes" error={errorOf('notes')}>
        {({ id }) => <textarea id={id} rows={3} className="w-full rounded-md border border-slate-line bg-paper-raised px-3 py-2 disabled:bg-paper-sunk" {...register('notes')} />}
      </Field>
    </fieldset>
  );
}
