import Papa from 'papaparse';
import { useMemo, useState } from 'react';
import { onsetCaseResultFields, type OnsetCaseResult } from '../../../../shared/schemas/onset';
import { Button } from '../../../components/ui/button';
import { Pagination } from '../../../components/ui/pagination';
import { StatusBadge } from '../../../components/ui/status-badge';
import { formatInSystem, formatNumber, type UnitSystem } from '../../../lib/unit-system';

const PAGE_SIZE = 50;

/** The results as the `onset` command writes them: same columns, SI, blank for "none". */
export function resultsToCsv(results: OnsetCaseResult[]): string {
  return Papa.unparse({
    fields: [...onsetCaseResultFields],
    data: results.map((result) => onsetCaseResultFields.map((field) => (result[field] === null ? '' : String(result[field])))),
  });
}

function downloadCsv(results: OnsetCaseResult[], name: string) {
  const blob = new Blob([resultsToCsv(results)], { type: 'text/csv;charset=utf-8' });
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

function marginBadge(result: OnsetCaseResult) {
  if (result.error) return <StatusBadge tone="neutral">Error</StatusBadge>;
  if (result.margin === null) return <StatusBadge tone="quiet">Quiet</StatusBadge>;
  if (result.margin >= 1.25) return <StatusBadge tone="quiet">Quiet</StatusBadge>;
  if (result.margin >= 1) return <StatusBadge tone="close">Close</StatusBadge>;
  return <StatusBadge tone="over">Over</StatusBadge>;
}

/** One row per case: the verdict first, the numbers in the person's units, the error of a bad row beside it. */
export function BatchResults({ results, where, fileName, system }: { results: OnsetCaseResult[]; where: string[]; fileName: string; system: UnitSystem }) {
  const [onlyErrors, setOnlyErrors] = useState(false);
  const [page, setPage] = useState(1);
  const errorCount = results.filter((result) => result.error).length;
  const rows = useMemo(() => results.map((result, index) => ({ result, where: where[index] ?? `case ${index + 1}` })).filter((row) => !onlyErrors || row.result.error), [results, where, onlyErrors]);
  const shown = rows.slice((page - 1) * PAGE_SIZE, page * PAGE_SIZE);

  return (
    <section aria-labelledby="batch-results-title" className="flex flex-col gap-3" data-testid="batch-results">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="batch-results-title" className="text-lg font-semibold">
            Results
          </h2>
          <p className="text-sm text-ink-soft">
            {results.length} {results.length === 1 ? 'case' : 'cases'} · {errorCount} with errors. The CSV download has the `onset` command&apos;s columns in SI.
          </p>
        </div>
        <div className="no-print flex flex-wrap items-center gap-3">
          <label className="flex min-h-11 items-center gap-2 text-sm">
            <input type="checkbox" className="size-5" checked={onlyErrors} onChange={(event) => { setOnlyErrors(event.target.checked); setPage(1); }} />
            Only rows with errors
          </label>
          <Button variant="secondary" onClick={() => downloadCsv(results, fileName.replace(/\.(csv|json)$/i, '') + '-results.csv')}>
            Download results CSV
          </Button>
        </div>
      </div>
      <div className="overflow-x-auto rounded-md border border-slate-line bg-paper-raised">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Batch results</caption>
          <thead className="bg-paper-sunk text-ink-soft">
            <tr>
              {['Case', 'Where', 'Verdict', 'Margin', 'Regime', 'Ra', 'Ma', 'Bi', 'Ra_c', 'Ma_c', 'k_c', 'Wavelength', 'Largest quiet depth', 'Smallest quiet depth', 'Largest quiet ΔT'].map((label) => (
                <th key={label} scope="col" className="border-b border-slate-line px-2 py-2 font-semibold whitespace-nowrap">
                  {label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.map(({ result, where: place }) => (
              <tr key={place} className="border-b border-slate-line/70 align-top">
                <th scope="row" className="px-2 py-1.5 font-medium whitespace-nowrap">{result.id || '—'}</th>
                <td className="px-2 py-1.5 whitespace-nowrap text-ink-soft">{place}</td>
                <td className="px-2 py-1.5">{marginBadge(result)}</td>
                {result.error ? (
                  <td colSpan={12} className="px-2 py-1.5 font-medium text-over-dark">
                    ✕ {result.error}
                  </td>
                ) : (
                  <>
                    <td className="px-2 py-1.5 text-right tabular-nums">{result.margin === null ? 'no onset' : `${formatNumber(result.margin, 3)}×`}</td>
                    <td className="px-2 py-1.5 whitespace-nowrap">{result.regime ?? '—'}</td>
                    <td className="px-2 py-1.5 text-right tabular-nums">{formatNumber(result.rayleigh)}</td>
                    <td className="px-2 py-1.5 text-right tabular-nums">{formatNumber(result.marangoni)}</td>
                    <td className="px-2 py-1.5 text-right tabular-nums">{result.biot === 'Infinity' ? '∞' : formatNumber(result.biot)}</td>
                    <td className="px-2 py-1.5 text-right tabular-nums">{formatNumber(result.criticalRayleigh)}</td>
                    <td className="px-2 py-1.5 text-right tabular-nums">{formatNumber(result.criticalMarangoni)}</td>
                    <td className="px-2 py-1.5 text-right tabular-nums">{formatNumber(result.criticalWavenumber)}</td>
                    <td className="px-2 py-1.5 text-right whitespace-nowrap tabular-nums">{formatInSystem(result.wavelength, 'length', system)}</td>
                    <td className="px-2 py-1.5 text-right whitespace-nowrap tabular-nums">{formatInSystem(result.maxStableDepth, 'length', system)}</td>
                    <td className="px-2 py-1.5 text-right whitespace-nowrap tabular-nums">{formatInSystem(result.minStableDepth, 'length', system)}</td>
                    <td className="px-2 py-1.5 text-right whitespace-nowrap tabular-nums">{formatInSystem(result.maxDeltaT, 'temperatureDifference', system)}</td>
                  </>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length > PAGE_SIZE && <Pagination label="Results" page={page} pageSize={PAGE_SIZE} total={rows.length} onPageChange={setPage} />}
    </section>
  );
}
