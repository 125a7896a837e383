import { useQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { processKindLabels } from '../../../shared/schemas/layer-checks';
import { roleLabels } from '../../../shared/schemas/roles';
import type { SheetDetail } from '../../../shared/schemas/sheets';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { StatusBadge } from '../../components/ui/status-badge';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { sheetPdfUrl, sheetQueryOptions } from '../../features/sheets/api/get-sheet';
import { SheetActionsPanel } from '../../features/sheets/components/sheet-actions-panel';
import { SheetHistory } from '../../features/sheets/components/sheet-history';
import { SheetStateBadge } from '../../features/sheets/components/sheet-state-badge';
import { isApiError } from '../../lib/api-client';
import { queryClient } from '../../lib/query-client';
import { formatNumber } from '../../lib/unit-system';
import { formatDateTime } from '../../utils/format';
import { RoleGate } from '../role-gate';
import { hasRole } from '../route-access';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.sheets);
const marginWords = { quiet: 'Quiet', close: 'Close', over: 'Over' } as const;

export async function loader({ request, params }: LoaderFunctionArgs) {
  if (params.id && (await hasRole(request, roles))) await queryClient.ensureQueryData(sheetQueryOptions(params.id)).catch(() => undefined);
  return null;
}

function Facts({ sheet }: { sheet: SheetDetail }) {
  const results = sheet.snapshot.results;
  const rows: [string, React.ReactNode][] = [
    ['Line', sheet.line],
    ['Purpose', sheet.purpose],
    ['Process', processKindLabels[sheet.processKind]],
    [
      'Layer check',
      <Link key="check" to={`${paths.layerChecks}/${sheet.checkId}`} className="text-brand-dark underline underline-offset-2">
        {sheet.snapshot.check.title}, revision {sheet.checkRevision}
      </Link>,
    ],
    ['Fluid', sheet.snapshot.fluid.name],
    [
      'Onset margin',
      <span key="margin" className="inline-flex items-center gap-2">
        <span className="tabular-nums">{results.margin === null ? 'no onset possible' : `${formatNumber(results.margin, 3)}×`}</span>
        <StatusBadge tone={results.status}>{marginWords[results.status]}</StatusBadge>
      </span>,
    ],
    ['Regime', results.regimeLabel],
    ['Author', `${sheet.authorName}, ${formatDateTime(sheet.createdAt)}`],
    ['Solver', sheet.solverVersion],
  ];
  return (
    <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-2 rounded-md border border-slate-line bg-paper-raised p-4">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-ink-soft">{label}</dt>
          <dd className="min-w-0 break-words">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** 21 CFR 11.50: name, date and time, and meaning shown with the record on screen too. */
function SignatureBlock({ sheet }: { sheet: SheetDetail }) {
  if (!sheet.signature) {
    return (
      <p className="rounded-md border border-dashed border-slate-line bg-paper-raised p-4 text-ink-soft">
        Not signed. {sheet.state === 'awaiting-review' ? 'Waiting for a QA reviewer.' : sheet.state === 'draft' ? 'The author submits it for review when ready.' : ''}
      </p>
    );
  }
  const s = sheet.signature;
  return (
    <dl aria-label="Signature" className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-1 rounded-md border border-quiet/50 bg-quiet-light/40 p-4">
      <dt className="font-semibold">Signed by</dt>
      <dd>{s.printedName}</dd>
      <dt className="font-semibold">Role</dt>
      <dd>{roleLabels[s.role]}</dd>
      <dt className="font-semibold">Date and time</dt>
      <dd>{formatDateTime(s.signedAt, 'UTC')} UTC</dd>
      <dt className="font-semibold">Meaning</dt>
      <dd>{s.meaningText}</dd>
      <dt className="font-semibold">PDF SHA-256</dt>
      <dd className="font-mono text-sm break-all">{s.pdfSha256}</dd>
    </dl>
  );
}

function SheetPage({ id }: { id: string }) {
  const sheet = useQuery(sheetQueryOptions(id));
  useDocumentTitle(sheet.data ? `${sheet.data.number} rev. ${sheet.data.revision}` : 'Process sheet');
  if (sheet.isPending) return <Loading label="Loading the process sheet…" />;
  if (sheet.isError) {
    return (
      <Notice tone="error" title={isApiError(sheet.error) && sheet.error.status === 404 ? 'There is no such process sheet' : 'Could not load the process sheet'}>
        {sheet.error.message} <Link to={paths.sheets} className="underline">Back to the list</Link>
      </Notice>
    );
  }
  const s = sheet.data;
  return (
    <>
      <PageHeader
        title={`${s.number} revision ${s.revision}`}
        lead={
          <span className="flex flex-wrap items-center gap-2">
            <SheetStateBadge state={s.state} /> <span>{s.title}</span>
          </span>
        }
      />
      <div className="flex flex-col gap-6">
        {s.state === 'superseded' && s.supersededBy && (
          <Notice tone="caution" title="Superseded">
            Revision {s.supersededBy.revision} replaces this one.{' '}
            <Link to={`/sheets/${s.supersededBy.id}`} className="underline">
              Open revision {s.supersededBy.revision}
            </Link>
          </Notice>
        )}
        {s.returns.length > 0 && (
          <Notice tone="caution" title="Returned by the reviewer">
            <ul className="flex flex-col gap-1">
              {s.returns.map((r) => (
                <li key={r.returnedAt}>
                  {r.reviewerName}, {formatDateTime(r.returnedAt)}: “{r.comments}”
                </li>
              ))}
            </ul>
          </Notice>
        )}
        <SheetActionsPanel sheet={s} />
        <div className="grid gap-6 xl:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]">
          <div className="flex flex-col gap-4">
            <Facts sheet={s} />
            <section aria-labelledby="signature-heading">
              <h2 id="signature-heading" className="mb-2 text-lg font-semibold">
                Signature
              </h2>
              <SignatureBlock sheet={s} />
            </section>
          </div>
          <section aria-labelledby="pdf-heading" className="flex min-w-0 flex-col gap-2">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <h2 id="pdf-heading" className="text-lg font-semibold">
                PDF{s.signature ? ' as signed' : ` (${s.state === 'returned' ? 'returned' : 'unsigned'} preview)`}
              </h2>
              <a href={sheetPdfUrl(s.id, { download: true })} className="inline-flex min-h-11 items-center rounded-md border border-slate-line bg-paper-raised px-4 font-medium hover:border-brand">
                Download PDF
              </a>
            </div>
            <iframe key={`${s.id}-${s.state}`} src={sheetPdfUrl(s.id)} title={`PDF of ${s.number} revision ${s.revision}`} className="h-[48rem] w-full rounded-md border border-slate-line bg-paper-sunk" />
          </section>
        </div>
        <SheetHistory sheet={s} />
      </div>
    </>
  );
}

export function Component() {
  const { id = '' } = useParams();
  return (
    <RoleGate roles={roles} pageName="Process sheet">
      <SheetPage id={id} />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
