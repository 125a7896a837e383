import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, useSearchParams } from 'react-router-dom';
import { gaugeFlagValues, type GaugeFlag } from '../../../shared/schemas/gauge-log';
import { processKindLabels } from '../../../shared/schemas/layer-checks';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { exportUrl, useGaugeWindow, useReadingSeries, type ReadingParams } from '../../features/gauge-log/api/gauge-queries';
import { formatMargin, formatThickness } from '../../features/gauge-log/components/format-gauge';
import { NotesPanel } from '../../features/gauge-log/components/notes-panel';
import { ReadingsTable } from '../../features/gauge-log/components/readings-table';
import { RunSummary } from '../../features/gauge-log/components/run-summary';
import { SpotsPanel } from '../../features/gauge-log/components/spots-panel';
import { ThicknessChart } from '../../features/gauge-log/components/thickness-chart';
import { TokensPanel } from '../../features/gauge-log/components/tokens-panel';
import { UploadPanel } from '../../features/gauge-log/components/upload-panel';
import { useUnitSystem } from '../../lib/unit-system';
import { readPage, readText, withParams } from '../../utils/search-params';
import { RoleGate } from '../role-gate';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.gauge);

function GaugeDetailPage({ revisionId }: { revisionId: string }) {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [system] = useUnitSystem();
  const [search, setSearch] = useSearchParams();
  const flag = search.get('flag');
  const params: ReadingParams = {
    page: readPage(search),
    pageSize: 50,
    flag: (gaugeFlagValues as readonly string[]).includes(flag ?? '') ? (flag as GaugeFlag) : undefined,
    run: readText(search, 'run'),
  };
  const window = useGaugeWindow(revisionId);
  const series = useReadingSeries(revisionId, params.run);
  if (window.isPending) return <Loading label="Loading the released check…" />;
  if (window.isError) {
    return (
      <Notice tone="error" title="Could not load this released check">
        {window.error.message}
      </Notice>
    );
  }
  const w = window.data;
  const canUpload = me.role === 'technician' || me.role === 'engineer';
  return (
    <>
      <PageHeader
        title={`${w.number} rev. ${w.revision}: ${w.title}`}
        lead={
          <>
            {w.line} · {processKindLabels[w.processKind]} · released at {formatThickness(w.checkThickness, system)} wet, margin {formatMargin(w.checkMargin)} · owner {w.ownerName}
          </>
        }
        actions={
          <a className="inline-flex min-h-11 items-center rounded-md border border-slate-line px-4 text-ink hover:border-brand" href={exportUrl(revisionId, { run: params.run, flag: params.flag })} download>
            Export judged readings (CSV)
          </a>
        }
      />
      <div className="flex flex-col gap-8">
        <dl className="grid gap-3 text-sm tabular-nums sm:grid-cols-2 lg:grid-cols-4" aria-label="Quiet window">
          <div className="rounded-md border border-slate-line p-3">
            <dt className="text-ink-soft">Smallest quiet wet thickness</dt>
            <dd className="text-xl font-semibold">{w.quietLimits.lower === null ? 'none' : formatThickness(w.quietLimits.lower, system)}</dd>
          </div>
          <div className="rounded-md border border-slate-line p-3">
            <dt className="text-ink-soft">Largest quiet wet thickness</dt>
            <dd className="text-xl font-semibold">{w.quietLimits.upper === null ? 'no limit found' : formatThickness(w.quietLimits.upper, system)}</dd>
          </div>
          <div className="rounded-md border border-slate-line p-3">
            <dt className="text-ink-soft">Close (margin below {w.alertThreshold})</dt>
            <dd className="text-xl font-semibold">
              {[w.closeLimits.lower === null ? null : `below ${formatThickness(w.closeLimits.lower, system)}`, w.closeLimits.upper === null ? null : `above ${formatThickness(w.closeLimits.upper, system)}`]
                .filter(Boolean)
                .join(', ') || 'nowhere in range'}
            </dd>
          </div>
          <div className="rounded-md border border-slate-line p-3">
            <dt className="text-ink-soft">Readings · Over</dt>
            <dd className="text-xl font-semibold">
              {w.readingCount.toLocaleString('en-GB')} · {w.overCount.toLocaleString('en-GB')}
            </dd>
          </div>
        </dl>
        <p className="max-w-4xl text-sm text-ink-soft">{w.method}</p>
        {canUpload && (
          <UploadPanel revisionId={revisionId} onSaved={() => setSearch(withParams(search, { page: undefined }))} />
        )}
        <section aria-labelledby="chart-heading" className="flex flex-col gap-2">
          <h2 id="chart-heading" className="text-lg font-semibold">
            Thickness along the run{params.run ? ` ${params.run}` : 's'}
          </h2>
          {series.isPending ? (
            <Loading label="Loading the chart data…" />
          ) : series.isError ? (
            <Notice tone="error" title="Could not load the chart data">
              {series.error.message}
            </Notice>
          ) : series.data.x.length === 0 ? (
            <p className="text-ink-soft">No readings yet: the chart appears after the first upload or gauge post.</p>
          ) : (
            <>
              {series.data.truncated && (
                <p className="text-sm text-ink-soft">Showing the newest {series.data.x.length.toLocaleString('en-GB')} of {series.data.total.toLocaleString('en-GB')} readings.</p>
              )}
              <ThicknessChart series={series.data} window={w} system={system} />
            </>
          )}
        </section>
        <RunSummary revisionId={revisionId} onPickRun={(run) => setSearch(withParams(search, { run, page: undefined }))} />
        <ReadingsTable
          revisionId={revisionId}
          params={params}
          onParams={(next) => setSearch(withParams(search, { ...('page' in next ? { page: next.page } : {}), ...('flag' in next ? { flag: next.flag } : {}), ...('run' in next ? { run: next.run } : {}) }))}
        />
        <SpotsPanel key={params.run ?? ''} revisionId={revisionId} run={params.run ?? ''} />
        <NotesPanel revisionId={revisionId} />
        {me.role === 'engineer' && <TokensPanel revisionId={revisionId} />}
      </div>
    </>
  );
}

function GaugeDetail() {
  const { revisionId = '' } = useParams();
  return <GaugeDetailPage revisionId={revisionId} />;
}

export function Component() {
  useDocumentTitle('Gauge log');
  return (
    <RoleGate roles={roles} pageName="Gauge log">
      <GaugeDetail />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
