import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useFieldArray, useForm, type FieldPath, type Resolver } from 'react-hook-form';
import { distributionValues, fluidInputSchema, fluidKindLabels, fluidKindValues, type FluidInput } from '../../../../shared/schemas/fluids';
import { Button } from '../../../components/ui/button';
import { Field, Select, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { QuantityField } from '../../../components/units/quantity-field';
import { isApiError } from '../../../lib/api-client';
import { formValuesToFluidInput, propertyRows, type FluidFormValues, type PropertyRow } from './fluid-form-values';

const schemaResolver = zodResolver(fluidInputSchema) as unknown as Resolver<FluidInput>;

/** Checks the values that would be sent with the server's own schema; error paths match the form's fields. */
const fluidFormResolver: Resolver<FluidFormValues> = async (values, context, options) => {
  const result = await schemaResolver(formValuesToFluidInput(values), context, options as never);
  if (Object.keys(result.errors).length > 0) return { values: {}, errors: result.errors as never };
  return { values, errors: {} };
};

export interface FluidFormProps {
  defaultValues: FluidFormValues;
  readOnly: boolean;
  submitLabel: string;
  busy: boolean;
  /** Resolves when saved; rejects with the server's error (field errors go beside the fields). */
  onSave: (input: FluidInput) => Promise<unknown>;
}

const cellClass = 'grid grid-cols-1 gap-3 sm:grid-cols-[minmax(0,19rem)_minmax(0,1fr)_6rem_9.5rem] sm:items-start';

/**
 * Everything a fluid is made of: each property typed with its unit, its source, its ± % and the
 * spread used by Property spread. The live note under each value shows what the server will read.
 */
export function FluidForm({ defaultValues, readOnly, submitLabel, busy, onSave }: FluidFormProps) {
  const [formError, setFormError] = useState<{ message: string; fields: [string, string][] }>();
  const {
    control,
    register,
    handleSubmit,
    watch,
    setError,
    formState: { errors, isDirty },
  } = useForm<FluidFormValues>({ resolver: fluidFormResolver, defaultValues });
  const points = useFieldArray({ control, name: 'viscosity.points' });
  const law = watch('viscosity.law');

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    try {
      await onSave(formValuesToFluidInput(values));
    } catch (error) {
      if (isApiError(error)) {
        const fields = Object.entries(error.fields ?? {});
        for (const [path, message] of fields) setError(path as FieldPath<FluidFormValues>, { type: 'server', message });
        setFormError({ message: error.message, fields });
      } else {
        setFormError({ message: error instanceof Error ? error.message : 'The fluid was not saved.', fields: [] });
      }
    }
  });

  const errorAt = (path: string): string | undefined => {
    let node: unknown = errors;
    for (const part of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[part];
    return (node as { message?: string } | undefined)?.message;
  };

  const propertyFieldset = (row: PropertyRow) => (
    <fieldset key={row.key} className="rounded-md border border-slate-line/70 p-3" data-testid={`property-${row.key}`}>
      <legend className="px-1 text-sm font-semibold text-ink">
        {row.label}
        {row.optional && <span className="ml-1 font-normal text-ink-soft">(optional)</span>}
      </legend>
      <div className={cellClass}>
        <Controller
          control={control}
          name={`${row.key}.value`}
          render={({ field }) => (
            <QuantityField
              label="Value with unit"
              kinds={row.kinds}
              value={field.value}
              name={field.name}
              inputRef={field.ref}
              onChange={field.onChange}
              onBlur={field.onBlur}
              placeholder={`e.g. ${row.example}`}
              error={errorAt(`${row.key}.value`) ?? errorAt(row.key)}
              hint={row.hint}
            />
          )}
        />
        <TextField label="Source" placeholder="Handbook, table, paper or measurement" error={errorAt(`${row.key}.source`)} {...register(`${row.key}.source`)} />
        <TextField
          label="± %"
          type="number"
          inputMode="decimal"
          step="any"
          min={0}
          max={100}
          error={errorAt(`${row.key}.uncertaintyPercent`)}
          {...register(`${row.key}.uncertaintyPercent`, { valueAsNumber: true })}
        />
        <Field label="Spread" error={errorAt(`${row.key}.distribution`)}>
          {({ id }) => (
            <Select id={id} {...register(`${row.key}.distribution`)}>
              {distributionValues.map((value) => (
                <option key={value} value={value}>
                  {value === 'normal' ? 'Normal (1σ)' : 'Uniform'}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>
    </fieldset>
  );

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Fluid" className="flex flex-col gap-6">
      {formError && (
        <Notice tone="error" title="The fluid was not saved">
          <p>{formError.message}</p>
          {formError.fields.length > 0 && (
            <ul className="mt-1 list-disc pl-5">
              {formError.fields.map(([path, message]) => (
                <li key={path}>
                  <code className="text-sm">{path}</code>: {message}
                </li>
              ))}
            </ul>
          )}
        </Notice>
      )}
      <fieldset disabled={readOnly} className="flex min-w-0 flex-col gap-6">
        <section aria-labelledby="fluid-identity" className="grid grid-cols-1 gap-4 md:grid-cols-2">
          <h2 id="fluid-identity" className="text-lg font-semibold md:col-span-2">
            Name and temperature range
          </h2>
          <TextField label="Name" error={errors.name?.message} {...register('name')} />
          <Field label="Kind" error={errors.kind?.message}>
            {({ id, describedBy, invalid }) => (
              <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} {...register('kind')}>
                {fluidKindValues.map((kind) => (
                  <option key={kind} value={kind}>
                    {fluidKindLabels[kind]}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Controller
            control={control}
            name="referenceTemperature"
            render={({ field }) => (
              <QuantityField
                label="Reference temperature T₀"
                kinds={['temperature']}
                value={field.value}
                inputRef={field.ref}
                onChange={field.onChange}
                onBlur={field.onBlur}
                placeholder="e.g. 68 °F"
                hint="The properties below are stated at this temperature."
                error={errors.referenceTemperature?.message}
              />
            )}
          />
          <div className="grid grid-cols-2 gap-3">
            {(['validFrom', 'validTo'] as const).map((name) => (
              <Controller
                key={name}
                control={control}
                name={name}
                render={({ field }) => (
                  <QuantityField
                    label={name === 'validFrom' ? 'Valid from' : 'Valid to'}
                    kinds={['temperature']}
                    value={field.value}
                    inputRef={field.ref}
                    onChange={field.onChange}
                    onBlur={field.onBlur}
                    placeholder={name === 'validFrom' ? 'e.g. 0 °C' : 'e.g. 70 °C'}
                    error={errors[name]?.message}
                  />
                )}
              />
            ))}
          </div>
        </section>

        <section aria-labelledby="fluid-properties" className="flex flex-col gap-3">
          <h2 id="fluid-properties" className="text-lg font-semibold">
            Properties at T₀
          </h2>
          <p className="text-sm text-ink-soft">
            Type each value with its unit (“12 cP”, “35 dyn/cm”, “0.5 mil”, “68 °F”). The line under the box shows the value the server will store in SI and in
            your units. The ± % feeds Property spread: one standard deviation for a normal spread, the half-width for a uniform one.
          </p>
          {propertyRows.slice(0, 5).map(propertyFieldset)}

          <fieldset className="rounded-md border border-slate-line/70 p-3" data-testid="property-viscosity">
            <legend className="px-1 text-sm font-semibold text-ink">Viscosity μ(T)</legend>
            <div className="flex flex-col gap-3">
              <Field label="Temperature law" error={errorAt('viscosity.law')}>
                {({ id }) => (
                  <Select id={id} className="max-w-md" {...register('viscosity.law')}>
                    <option value="points">Measured points (one = constant; two or more fitted to μ = A·exp(B/T))</option>
                    <option value="andrade">Constants A and B of μ = A·exp(B/T)</option>
                  </Select>
                )}
              </Field>
              {law === 'points' ? (
                <div className="flex flex-col gap-2">
                  {points.fields.map((point, index) => (
                    <div key={point.id} className="grid grid-cols-1 gap-3 sm:grid-cols-[minmax(0,14rem)_minmax(0,19rem)_auto] sm:items-start">
                      <Controller
                        control={control}
                        name={`viscosity.points.${index}.temperature`}
                        render={({ field }) => (
                          <QuantityField
                            label={`Point ${index + 1}: temperature`}
                            kinds={['temperature']}
                            value={field.value}
                            inputRef={field.ref}
                            onChange={field.onChange}
                            onBlur={field.onBlur}
                            error={errorAt(`viscosity.points.${index}.temperature`)}
                          />
                        )}
                      />
                      <Controller
                        control={control}
                        name={`viscosity.points.${index}.value`}
                        render={({ field }) => (
                          <QuantityField
                            label={`Point ${index + 1}: viscosity`}
                            kinds={['dynamicViscosity', 'kinematicViscosity']}
                            value={field.value}
                            inputRef={field.ref}
                            onChange={field.onChange}
                            onBlur={field.onBlur}
                            placeholder="e.g. 12 cP or 15 cSt"
                            error={errorAt(`viscosity.points.${index}.value`)}
                          />
                        )}
                      />
                      {!readOnly && points.fields.length > 1 && (
                        <Button variant="quiet" size="sm" className="sm:mt-7" onClick={() => points.remove(index)} aria-label={`Remove point ${index + 1}`}>
                          Remove
                        </Button>
                      )}
                    </div>
                  ))}
                  {errorAt('viscosity.points') && <p className="text-sm font-medium text-over">{errorAt('viscosity.points')}</p>}
                  {!readOnly && points.fields.length < 20 && (
                    <Button variant="secondary" size="sm" className="self-start" onClick={() => points.append({ temperature: '', value: '' })}>
                      Add a point
                    </Button>
                  )}
                </div>
              ) : (
                <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
                  <Controller
                    control={control}
                    name="viscosity.preExponential"
                    render={({ field }) => (
                      <QuantityField
                        label="A (a viscosity)"
                        kinds={['dynamicViscosity']}
                        value={field.value}
                        inputRef={field.ref}
                        onChange={field.onChange}
                        onBlur={field.onBlur}
                        placeholder="e.g. 3.7e-3 mPa·s"
                        error={errorAt('viscosity.preExponential')}
                      />
                    )}
                  />
                  <Controller
                    control={control}
                    name="viscosity.activationTemperature"
                    render={({ field }) => (
                      <QuantityField
                        label="B (a temperature)"
                        kinds={['temperatureDifference']}
                        value={field.value}
                        inputRef={field.ref}
                        onChange={field.onChange}
                        onBlur={field.onBlur}
                        placeholder="e.g. 1692 K"
                        error={errorAt('viscosity.activationTemperature')}
                      />
                    )}
                  />
                </div>
              )}
              <div className="grid grid-cols-1 gap-3 sm:grid-cols-[minmax(0,1fr)_6rem_9.5rem]">
                <TextField label="Source" error={errorAt('viscosity.source')} {...register('viscosity.source')} />
                <TextField label="± %" type="number" inputMode="decimal" step="any" error={errorAt('viscosity.uncertaintyPercent')} {...register('viscosity.uncertaintyPercent', { valueAsNumber: true })} />
                <Field label="Spread">
                  {({ id }) => (
                    <Select id={id} {...register('viscosity.distribution')}>
                      <option value="normal">Normal (1σ)</option>
                      <option value="uniform">Uniform</option>
                    </Select>
                  )}
                </Field>
              </div>
            </div>
          </fieldset>

          {propertyRows.slice(5).map(propertyFieldset)}
        </section>

        <Field label="Notes" error={errors.notes?.message}>
          {({ id }) => <textarea id={id} rows={3} className="w-full rounded-md border border-slate-line bg-paper-raised px-3 py-2 disabled:bg-paper-sunk" {...register('notes')} />}
        </Field>
      </fieldset>

      {!readOnly && (
        <div className="no-print flex flex-wrap items-center gap-3">
          <Button type="submit" busy={busy} data-testid="save-fluid">
            {submitLabel}
          </Button>
          {isDirty && <span className="text-sm text-ink-soft">Unsaved changes</span>}
        </div>
      )}
      {readOnly && (
        <p className="text-sm text-ink-soft" data-testid="read-only-note">
          Read only: only a Process engineer changes the fluid library.
        </p>
      )}
    </form>
  );
}

