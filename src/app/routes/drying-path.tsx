import { useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useRef, useState } from 'react';
import type { DryingPathAnswer } from '../../../shared/schemas/drying-paths';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { useDryingPath } from '../../features/drying-path/api/drying-path-api';
import { DryingForm } from '../../features/drying-path/components/drying-form';
import { line2FormValues, valuesToDryingInput, type DryingFormValues } from '../../features/drying-path/components/drying-form-values';
import { DryingPlots } from '../../features/drying-path/components/drying-plots';
import { DryingResults } from '../../features/drying-path/components/drying-results';
import { SaveDryingSetup } from '../../features/drying-path/components/save-drying-setup';
import { isApiError } from '../../lib/api-client';
import { RoleGate } from '../role-gate';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.dryingPath);

function DryingPathPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [values, setValues] = useState<DryingFormValues>(line2FormValues);
  const [submitted, setSubmitted] = useState(() => valuesToDryingInput(line2FormValues()));
  const path = useDryingPath(submitted);
  const errors = useMemo(() => (isApiError(path.error) ? (path.error.fields ?? {}) : {}), [path.error]);
  // The last path that computed stays on screen while new inputs are refused.
  const lastGood = useRef<DryingPathAnswer | undefined>(undefined);
  if (path.data) lastGood.current = path.data;
  const shown = path.data ?? lastGood.current;

  return (
    <>
      <PageHeader
        title="Drying path"
        lead="Follow a wet coat or cast film zone by zone through the oven: thickness, film temperature and the thermal and solutal onset margins as the solvent leaves, whether cells outlive the drying, and each zone's solvent load and fresh air. Filled in with the Larkspur Line 2 demo."
      />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <div className="flex flex-col gap-4">
          <DryingForm values={values} errors={errors} busy={path.isFetching} onChange={setValues} onSubmit={() => setSubmitted(valuesToDryingInput(values))} />
          <SaveDryingSetup input={submitted} canSave={me.role === 'engineer'} />
        </div>
        <div className="flex min-w-0 flex-col gap-5" aria-live="polite">
          {path.isError && (
            <Notice tone="error" title={shown ? 'These inputs could not be computed; the last drying path is shown' : 'The drying path could not be computed'}>
              {path.error.message}
              {Object.keys(errors).length > 0 && (
                <ul className="mt-1 list-disc pl-5">
                  {Object.entries(errors).map(([field, message]) => (
                    <li key={field}>
                      {field}: {message}
                    </li>
                  ))}
                </ul>
              )}
            </Notice>
          )}
          {shown ? (
            <>
              <DryingResults answer={shown} />
              <DryingPlots answer={shown} />
            </>
          ) : path.isPending ? (
            <Loading label="Computing the drying path…" />
          ) : null}
        </div>
      </div>
    </>
  );
}

export function Component() {
  useDocumentTitle('Drying path');
  return (
    <RoleGate roles={roles} pageName="Drying path">
      <DryingPathPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
