import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import { processKindLabels } from '../../../shared/schemas/layer-checks';
import { Field, Select } from '../../components/ui/field';
import { Loading } from '../../components/ui/loading';
import { PageHeader } from '../../components/ui/page-header';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { useSpreadChecks } from '../../features/property-spread/api/spread-api';
import { PropertySpreadSection } from '../../features/property-spread/components/property-spread-section';
import { RoleGate } from '../role-gate';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.propertySpread);

function PropertySpreadPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const checks = useSpreadChecks();
  const [search, setSearch] = useSearchParams();
  const checkId = search.get('check') ?? checks.data?.items[0]?.id ?? null;

  return (
    <>
      <PageHeader
        title="Property spread"
        lead="Monte Carlo over each property's stated uncertainty for a saved layer check: the probability of onset, margin percentiles and which property moves the margin most. Results are stored with the check revision."
      />
      {checks.isPending ? (
        <Loading label="Loading layer checks…" />
      ) : checks.data && checks.data.items.length === 0 ? (
        <p className="rounded-md border border-dashed border-slate-line p-6 text-center text-ink-soft">No layer check yet: save one under Layer checks, then judge its uncertainty here.</p>
      ) : (
        <div className="flex flex-col gap-6">
          <Field label="Layer check" className="max-w-xl">
            {({ id }) => (
              <Select id={id} value={checkId ?? ''} onChange={(e) => setSearch({ check: e.target.value })}>
                {(checks.data?.items ?? []).map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.title} — {processKindLabels[c.processKind]}, revision {c.revision}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          {checkId && <PropertySpreadSection checkId={checkId} canRun={me.role === 'engineer'} />}
        </div>
      )}
    </>
  );
}

export function Component() {
  useDocumentTitle('Property spread');
  return (
    <RoleGate roles={roles} pageName="Property spread">
      <PropertySpreadPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
