import { useSuspenseQuery } from '@tanstack/react-query';
import { useRef, useState, type FormEvent } from 'react';
import type { MeltPoolAnswer } from '../../../shared/schemas/melt-pool';
import { QuantityField } from '../../components/units/quantity-field';
import { Button } from '../../components/ui/button';
import { TextField } from '../../components/ui/field';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { useMeltPool } from '../../features/melt-pool/api/melt-pool-api';
import { HeatsRegister } from '../../features/melt-pool/components/heats-register';
import { JoinHeats } from '../../features/melt-pool/components/join-heats';
import { MeltPoolResults, WeldingCautions } from '../../features/melt-pool/components/melt-pool-results';
import { meltPoolFields, valuesToMeltPoolInput, weldCellFormValues, type MeltPoolFormValues } from '../../features/melt-pool/components/melt-pool-values';
import { SurfaceTensionCurve } from '../../features/melt-pool/components/surface-tension-curve';
import { isApiError } from '../../lib/api-client';
import type { QuantityKind } from '../../../shared/units/quantity-kinds';
import { RoleGate } from '../role-gate';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.meltPool);
const kinds: Partial<Record<keyof MeltPoolFormValues, QuantityKind>> = {
  edgeTemperature: 'temperature',
  peakTemperature: 'temperature',
  halfWidth: 'length',
  density: 'density',
  viscosity: 'dynamicViscosity',
  thermalDiffusivity: 'diffusivity',
};

function MeltPoolPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [values, setValues] = useState<MeltPoolFormValues>(weldCellFormValues);
  const [submitted, setSubmitted] = useState(() => valuesToMeltPoolInput(weldCellFormValues()));
  const result = useMeltPool(submitted);
  const errors = isApiError(result.error) ? (result.error.fields ?? {}) : {};
  const lastGood = useRef<MeltPoolAnswer | undefined>(undefined);
  if (result.data) lastGood.current = result.data;
  const shown = result.data ?? lastGood.current;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(valuesToMeltPoolInput(values));
  };

  return (
    <>
      <PageHeader
        title="Melt pool flow"
        lead="Surface tension of steel with sulfur by the adsorption model of Sahoo, DebRoy and McNallan (1988): the sign of dσ/dT across the pool, the surface flow direction and the pool shape it favours, with the Marangoni and Péclet numbers. Filled in with the Larkspur weld cell demo."
      />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,4fr)_minmax(0,8fr)]">
        <form onSubmit={submit} aria-label="Melt pool inputs" className="flex flex-col gap-3 self-start rounded-md border border-slate-line bg-paper-raised p-4">
          {meltPoolFields.map((f) => {
            const kind = kinds[f.key];
            return kind ? (
              <QuantityField key={f.key} label={f.label} kinds={[kind]} hint={f.hint} value={values[f.key]} error={errors[f.key]} onChange={(text) => setValues({ ...values, [f.key]: text })} />
            ) : (
              <TextField key={f.key} label={f.label} hint={f.hint} value={values[f.key]} error={errors[f.key]} onChange={(e) => setValues({ ...values, [f.key]: e.target.value })} />
            );
          })}
          <div>
            <Button type="submit" busy={result.isFetching}>
              Compute the flow
            </Button>
          </div>
        </form>
        <div className="flex min-w-0 flex-col gap-5" aria-live="polite">
          {result.isError && (
            <Notice tone="error" title={shown ? 'These inputs could not be computed; the last result is shown' : 'The flow could not be computed'}>
              {result.error.message}
            </Notice>
          )}
          {shown ? (
            <>
              <MeltPoolResults answer={shown} />
              <SurfaceTensionCurve answer={shown} />
              <WeldingCautions cautions={shown.cautions} />
            </>
          ) : result.isPending ? (
            <Loading label="Computing the melt pool flow…" />
          ) : null}
        </div>
      </div>
      <div className="mt-8 flex flex-col gap-8">
        <JoinHeats input={submitted} canSave={me.role === 'engineer'} />
        <HeatsRegister canEdit={me.role === 'engineer'} />
      </div>
    </>
  );
}

export function Component() {
  useDocumentTitle('Melt pool flow');
  return (
    <RoleGate roles={roles} pageName="Melt pool flow">
      <MeltPoolPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
