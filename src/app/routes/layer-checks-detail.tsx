import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Link, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { layerCheckInputSchema, processKindLabels, type LayerCheck } from '../../../shared/schemas/layer-checks';
import { parseQuantity } from '../../../shared/units/parse-quantity';
import { Button } from '../../components/ui/button';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { StatusBadge } from '../../components/ui/status-badge';
import { UnitSystemSelect } from '../../components/units/unit-system-select';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { fluidsQueryOptions, useFluids } from '../../features/fluids/api/get-fluids';
import { useLayerEvaluation } from '../../features/layer-checks/api/evaluate-layer-check';
import { layerCheckQueryOptions, useLayerCheck, useLayerCheckRevisions } from '../../features/layer-checks/api/get-layer-check';
import { useCreateLayerCheck, useUpdateLayerCheck } from '../../features/layer-checks/api/save-layer-check';
import { CautionsPanel, EvaluationPanel } from '../../features/layer-checks/components/evaluation-panel';
import { placeSchemaErrors, placeServerErrors, type PlacedErrors } from '../../features/layer-checks/components/layer-check-errors';
import { LayerCheckForm, type FluidOption } from '../../features/layer-checks/components/layer-check-form';
import {
  emptyLayerCheckValues,
  layerCheckToValues,
  valuesToEvaluationInput,
  valuesToLayerCheckInput,
  type LayerCheckFormValues,
} from '../../features/layer-checks/components/layer-check-form-values';
import { useDebouncedValue } from '../../features/layer-checks/hooks/use-debounced-value';
import { useQuietWindow } from '../../features/quiet-window/api/get-quiet-window';
import { QuietWindowFigure } from '../../features/quiet-window/components/quiet-window-figure';
import { isApiError } from '../../lib/api-client';
import { queryClient } from '../../lib/query-client';
import { useUnitSystem } from '../../lib/unit-system';
import { formatDateTime } from '../../utils/format';
import { roleLabels } from '../../../shared/schemas/roles';
import { RoleGate } from '../role-gate';
import { IssueSheetLink } from '../../features/sheets/components/issue-sheet-link';
import { hasRole } from '../route-access';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.layerChecks);
const fluidPickerParams = { page: 1, pageSize: 200, sort: 'name' as const, dir: 'asc' as const };

export async function loader({ request, params }: LoaderFunctionArgs) {
  if (await hasRole(request, roles)) {
    await Promise.all([
      queryClient.ensureQueryData(fluidsQueryOptions(fluidPickerParams)),
      params.id && params.id !== 'new' ? queryClient.ensureQueryData(layerCheckQueryOptions(params.id)).catch(() => undefined) : undefined,
    ]);
  }
  return null;
}

function panelWidthSi(text: string): number | null {
  try {
    return text.trim() ? parseQuantity(text, 'length') : null;
  } catch {
    return null;
  }
}

interface EditorProps {
  check?: LayerCheck;
  fluids: FluidOption[];
  canWrite: boolean;
  roleLabel: string;
  initialFluidId?: string;
  onReload: () => Promise<void>;
}

/** The screen an engineer lives in: inputs on the left, the live verdict on the right, the quiet window below. */
function LayerCheckEditor({ check: loaded, fluids, canWrite, roleLabel, initialFluidId, onReload }: EditorProps) {
  // The revision this editor was opened on (or last saved): its version goes with the next save, so a
  // newer revision fetched meanwhile (e.g. to describe a conflict) never turns a stale edit into an overwrite.
  const [check, setCheck] = useState(loaded);
  const navigate = useNavigate();
  const client = useQueryClient();
  const [system] = useUnitSystem();
  const defaultValues = useMemo(() => (check ? layerCheckToValues(check) : emptyLayerCheckValues(initialFluidId ?? '')), [check, initialFluidId]);
  const form = useForm<LayerCheckFormValues>({ defaultValues });
  const values = useWatch({ control: form.control }) as LayerCheckFormValues;
  const body = useDebouncedValue(valuesToEvaluationInput(values), 300);
  const evaluation = useLayerEvaluation(body);
  const quietWindow = useQuietWindow(body);
  const create = useCreateLayerCheck();
  const update = useUpdateLayerCheck();
  const [saveErrors, setSaveErrors] = useState<PlacedErrors>();
  const [conflict, setConflict] = useState<LayerCheck | 'unknown'>();
  const [savedRevision, setSavedRevision] = useState<number>();
  useDocumentTitle(check ? check.title : 'New layer check');

  const liveErrors = evaluation.isError ? placeServerErrors(evaluation.error) : undefined;
  const fieldErrors = { ...(liveErrors?.fields ?? {}), ...(saveErrors?.fields ?? {}) };
  const shown = evaluation.data;
  const stale = evaluation.isFetching || evaluation.isError || JSON.stringify(body) !== JSON.stringify(valuesToEvaluationInput(values));

  const save = async () => {
    setSaveErrors(undefined);
    setSavedRevision(undefined);
    const input = valuesToLayerCheckInput(form.getValues());
    const checked = layerCheckInputSchema.safeParse(input);
    if (!checked.success) {
      setSaveErrors(placeSchemaErrors(checked.error));
      return;
    }
    try {
      if (!check) {
        const created = await create.mutateAsync(input);
        await navigate(`${paths.layerChecks}/${created.id}`, { replace: true });
        return;
      }
      const saved = await update.mutateAsync({ id: check.id, input, version: check.version });
      setSavedRevision(saved.revision);
      setCheck(saved);
      client.setQueryData(layerCheckQueryOptions(check.id).queryKey, saved);
      form.reset(layerCheckToValues(saved));
    } catch (error) {
      if (check && isApiError(error) && error.status === 409) {
        const current = await client.fetchQuery({ ...layerCheckQueryOptions(check.id), staleTime: 0 }).catch(() => undefined);
        setConflict(current ?? 'unknown');
        return;
      }
      setSaveErrors(placeServerErrors(error) ?? { fields: {}, other: [error instanceof Error ? error.message : 'The check was not saved.'] });
    }
  };

  const threshold = shown?.alertThreshold ?? 1.25;

  return (
    <>
      <PageHeader
        title={check ? check.title : 'New layer check'}
        lead={
          check ? (
            <span className="flex flex-wrap items-center gap-2" data-testid="check-meta">
              {processKindLabels[check.processKind]} · {check.fluidName} · revision {check.revision} · version {check.version} · owner {check.ownerName ?? '—'} · saved{' '}
              {formatDateTime(check.updatedAt)}
            </span>
          ) : (
            'Describe the layer; the verdict updates as you type.'
          )
        }
        actions={
          <>
            <UnitSystemSelect />
            {check && canWrite && <IssueSheetLink checkId={check.id} role="engineer" />}
            {canWrite && (
              <Button onClick={() => void save()} busy={create.isPending || update.isPending} data-testid="save-check">
                {check ? 'Save new revision' : 'Save check'}
              </Button>
            )}
          </>
        }
      />
      <div className="flex flex-col gap-4">
        {!canWrite && (
          <Notice tone="info" title="Read only">
            As {roleLabel} you can read this check and its live results; only a Process engineer changes it.
          </Notice>
        )}
        {conflict && (
          <Notice tone="caution" title="Someone saved a newer version">
            <p data-testid="conflict">
              {conflict === 'unknown'
                ? 'This check was changed by someone else while you had it open.'
                : `The server now holds revision ${conflict.revision} (version ${conflict.version}), saved ${formatDateTime(conflict.updatedAt)}${conflict.ownerName ? ` — owner ${conflict.ownerName}` : ''}.`}{' '}
              Your changes were not saved. Reload to see the newer version, then make your change again.
            </p>
            <Button className="mt-2" size="sm" onClick={() => void onReload()}>
              Reload the newer version
            </Button>
          </Notice>
        )}
        {savedRevision !== undefined && !conflict && (
          <Notice tone="success" title="Saved">
            Revision {savedRevision} is stored.
          </Notice>
        )}
        {saveErrors && saveErrors.other.length + Object.keys(saveErrors.fields).length > 0 && (
          <Notice tone="error" title="The check was not saved">
            {Object.keys(saveErrors.fields).length > 0 && <p>Some values need attention: see the messages beside the fields.</p>}
            {saveErrors.other.map((message) => (
              <p key={message}>{message}</p>
            ))}
          </Notice>
        )}
        <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,29rem)_minmax(0,1fr)]">
          <section aria-label="Inputs" className="min-w-0">
            <form noValidate onSubmit={(event) => event.preventDefault()}>
              <LayerCheckForm form={form} fluids={fluids} readOnly={!canWrite} serverErrors={fieldErrors} />
            </form>
            {check && <Revisions id={check.id} />}
          </section>
          <section aria-label="Results" className="min-w-0" aria-live="polite">
            {liveErrors && (
              <Notice tone="error" title="Not evaluated yet" className="mb-4">
                {liveErrors.other.length > 0 ? liveErrors.other.join(' · ') : 'Fix the values marked beside the fields; the results follow at once.'}
              </Notice>
            )}
            {!body && <Notice tone="info" title="Choose a fluid">Pick a fluid and give a depth and temperature; the results appear here as you type.</Notice>}
            {body && !shown && evaluation.isPending && <Loading label="Evaluating…" />}
            {shown && <EvaluationPanel evaluation={shown} system={system} panelWidth={panelWidthSi(values.panelWidth)} stale={stale} />}
          </section>
        </div>
        <section aria-labelledby="window-title" className="rounded-md border border-slate-line bg-paper-raised p-4">
          <h2 id="window-title" className="mb-1 text-lg font-semibold">
            Quiet window
          </h2>
          <p className="mb-3 text-sm text-ink-soft">Onset margin over layer depth and {quietWindow.data?.driveKind === 'heat-flux' ? 'heat flux' : 'temperature difference'} for this fluid and these boundaries.</p>
          {quietWindow.isError ? (
            <Notice tone="error" title="No window yet">{quietWindow.error.message}</Notice>
          ) : quietWindow.data ? (
            <QuietWindowFigure window={quietWindow.data} system={system} threshold={threshold} />
          ) : body ? (
            <Loading label="Computing the quiet window…" />
          ) : (
            <p className="text-ink-soft">The window appears once the check can be evaluated.</p>
          )}
        </section>
        {shown && <CautionsPanel cautions={shown.cautions} closingLine={shown.closingLine} />}
      </div>
    </>
  );
}

function Revisions({ id }: { id: string }) {
  const revisions = useLayerCheckRevisions(id);
  if (!revisions.data || revisions.data.items.length === 0) return null;
  return (
    <details className="mt-5 rounded-md border border-slate-line bg-paper-raised p-3 text-sm" data-testid="revisions">
      <summary className="cursor-pointer font-semibold">Revisions ({revisions.data.items.length})</summary>
      <ol className="mt-2 flex flex-col gap-1">
        {revisions.data.items.map((revision) => (
          <li key={revision.revision} className="tabular-nums">
            Revision {revision.revision} · {formatDateTime(revision.savedAt)} · {revision.savedByName ?? '—'}
          </li>
        ))}
      </ol>
    </details>
  );
}

function LayerCheckPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { id } = useParams();
  const [search] = useSearchParams();
  const client = useQueryClient();
  const isNew = !id || id === 'new';
  const check = useLayerCheck(isNew ? undefined : id);
  const fluids = useFluids(fluidPickerParams);
  const [editorKey, setEditorKey] = useState(0);
  const canWrite = me.role === 'engineer';

  if (fluids.isPending || (!isNew && check.isPending)) return <Loading label="Loading the check…" />;
  if (!isNew && check.isError) {
    return (
      <Notice tone="error" title={isApiError(check.error) && check.error.status === 404 ? 'No such layer check' : 'Could not load the check'}>
        {check.error.message} <Link to={paths.layerChecks} className="underline">Back to the layer checks</Link>
      </Notice>
    );
  }
  if (isNew && !canWrite) {
    return <Notice tone="info" title="Only a Process engineer creates layer checks">Open an existing check from the list to read it.</Notice>;
  }
  const options: FluidOption[] = (fluids.data?.items ?? []).map((fluid) => ({ id: fluid.id, name: fluid.name, archived: fluid.archived }));
  const current = check.data;
  if (current && !options.some((option) => option.id === current.fluidId)) {
    options.unshift({ id: current.fluidId, name: current.fluidName, archived: current.fluidArchived });
  }
  const wanted = search.get('fluid');
  const initialFluidId = wanted && options.some((option) => option.id === wanted) ? wanted : options[0]?.id;

  const reload = async () => {
    if (!id) return;
    await client.fetchQuery({ ...layerCheckQueryOptions(id), staleTime: 0 });
    await client.invalidateQueries({ queryKey: ['layer-checks', 'revisions', id] });
    setEditorKey((key) => key + 1);
  };

  return (
    <LayerCheckEditor
      key={`${current?.id ?? 'new'}-${editorKey}`}
      check={current}
      fluids={options}
      canWrite={canWrite}
      roleLabel={roleLabels[me.role]}
      initialFluidId={initialFluidId}
      onReload={reload}
    />
  );
}

export function Component() {
  return (
    <RoleGate roles={roles} pageName="Layer checks">
      <LayerCheckPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
