import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { fluidKindLabels, type Fluid } from '../../../shared/schemas/fluids';
import { Button } from '../../components/ui/button';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { StatusBadge } from '../../components/ui/status-badge';
import { UnitSystemSelect } from '../../components/units/unit-system-select';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { useDuplicateFluid, useSetFluidArchived } from '../../features/fluids/api/fluid-actions';
import { fluidQueryOptions, useFluid } from '../../features/fluids/api/get-fluid';
import { useCreateFluid, useUpdateFluid } from '../../features/fluids/api/save-fluid';
import { FluidForm } from '../../features/fluids/components/fluid-form';
import { emptyFluidFormValues, fluidToFormValues } from '../../features/fluids/components/fluid-form-values';
import { FluidSummary } from '../../features/fluids/components/fluid-summary';
import { isApiError } from '../../lib/api-client';
import { queryClient } from '../../lib/query-client';
import { useUnitSystem } from '../../lib/unit-system';
import { formatDateTime } from '../../utils/format';
import { RoleGate } from '../role-gate';
import { hasRole } from '../route-access';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.fluids);

export async function loader({ request, params }: LoaderFunctionArgs) {
  if (params.id && params.id !== 'new' && (await hasRole(request, roles))) {
    await queryClient.ensureQueryData(fluidQueryOptions(params.id)).catch(() => undefined);
  }
  return null;
}

function NewFluidPage({ canWrite }: { canWrite: boolean }) {
  useDocumentTitle('New fluid');
  const navigate = useNavigate();
  const create = useCreateFluid();
  return (
    <>
      <PageHeader title="New fluid" lead="Type each value with the unit you have it in; the server converts to SI and keeps what you typed." actions={<UnitSystemSelect />} />
      {canWrite ? (
        <FluidForm
          defaultValues={emptyFluidFormValues()}
          readOnly={false}
          submitLabel="Save fluid"
          busy={create.isPending}
          onSave={async (input) => {
            const fluid = await create.mutateAsync(input);
            await navigate(`${paths.fluids}/${fluid.id}`, { replace: true });
          }}
        />
      ) : (
        <Notice tone="info" title="Only a Process engineer adds fluids">Ask a Process engineer to add the fluid you need.</Notice>
      )}
    </>
  );
}

function ExistingFluidPage({ id, canWrite }: { id: string; canWrite: boolean }) {
  const fluid = useFluid(id);
  const [system] = useUnitSystem();
  const navigate = useNavigate();
  const client = useQueryClient();
  const update = useUpdateFluid();
  const duplicate = useDuplicateFluid();
  const archive = useSetFluidArchived();
  const [conflict, setConflict] = useState<Fluid | null>(null);
  const [saved, setSaved] = useState(false);
  const [formKey, setFormKey] = useState(0);
  useDocumentTitle(fluid.data?.name ?? 'Fluid');

  if (fluid.isPending) return <Loading label="Loading the fluid…" />;
  if (fluid.isError) {
    return (
      <Notice tone="error" title={isApiError(fluid.error) && fluid.error.status === 404 ? 'No such fluid' : 'Could not load the fluid'}>
        {fluid.error.message} <Link to={paths.fluids} className="underline">Back to the fluid library</Link>
      </Notice>
    );
  }
  const current = fluid.data;

  const reload = async () => {
    await client.invalidateQueries({ queryKey: ['fluids', 'detail', id] });
    await client.fetchQuery(fluidQueryOptions(id));
    setConflict(null);
    setFormKey((key) => key + 1);
  };

  return (
    <>
      <PageHeader
        title={current.name}
        lead={
          <span className="flex flex-wrap items-center gap-2">
            {fluidKindLabels[current.kind]} · version {current.version} · updated {formatDateTime(current.updatedAt)} · used by {current.checkCount}{' '}
            {current.checkCount === 1 ? 'check' : 'checks'}
            {current.archived && <StatusBadge tone="neutral">Archived</StatusBadge>}
          </span>
        }
        actions={
          <>
            <UnitSystemSelect />
            {canWrite && (
              <>
                <Button
                  variant="secondary"
                  busy={duplicate.isPending}
                  onClick={() => duplicate.mutate({ id }, { onSuccess: (copy) => void navigate(`${paths.fluids}/${copy.id}`) })}
                >
                  Duplicate
                </Button>
                <Button
                  variant={current.archived ? 'secondary' : 'danger'}
                  busy={archive.isPending}
                  onClick={() =>
                    archive.mutate(
                      { id, version: current.version, archived: !current.archived },
                      { onSuccess: () => setFormKey((key) => key + 1), onError: (error) => isApiError(error) && error.status === 409 && setConflict(current) },
                    )
                  }
                >
                  {current.archived ? 'Restore' : 'Archive'}
                </Button>
              </>
            )}
          </>
        }
      />
      <div className="flex flex-col gap-6">
        {current.archived && (
          <Notice tone="info" title="Archived">
            This fluid no longer appears in the fluid picker. Checks that use it keep it{canWrite ? '; restore it to use it in new checks' : ''}.
          </Notice>
        )}
        {duplicate.isError && <Notice tone="error" title="Not duplicated">{duplicate.error.message}</Notice>}
        {archive.isError && !conflict && <Notice tone="error" title="Not changed">{archive.error.message}</Notice>}
        {conflict && (
          <Notice tone="caution" title="Someone saved a newer version">
            <p>
              This fluid was changed by someone else while you had it open. The server now holds version {current.version}
              {fluid.isFetching ? ' (checking…)' : ''}. Your changes were not saved: reload to see the newer version, then make your change again.
            </p>
            <Button className="mt-2" size="sm" onClick={() => void reload()}>
              Reload the newer version
            </Button>
          </Notice>
        )}
        {saved && !conflict && <Notice tone="success" title="Saved">Version {current.version} is stored.</Notice>}
        <FluidSummary fluid={current} system={system} />
        <FluidForm
          key={`${current.id}-${formKey}`}
          defaultValues={fluidToFormValues(current)}
          readOnly={!canWrite}
          submitLabel="Save changes"
          busy={update.isPending}
          onSave={async (input) => {
            setSaved(false);
            try {
              await update.mutateAsync({ id, input, version: current.version });
              setSaved(true);
              setFormKey((key) => key + 1);
            } catch (error) {
              if (isApiError(error) && error.status === 409) {
                setConflict(current);
                void client.invalidateQueries({ queryKey: ['fluids', 'detail', id] });
                return;
              }
              throw error;
            }
          }}
        />
      </div>
    </>
  );
}

function FluidPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { id } = useParams();
  const canWrite = me.role === 'engineer';
  if (!id || id === 'new') return <NewFluidPage canWrite={canWrite} />;
  return <ExistingFluidPage id={id} canWrite={canWrite} />;
}

export function Component() {
  return (
    <RoleGate roles={roles} pageName="Fluids">
      <FluidPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
