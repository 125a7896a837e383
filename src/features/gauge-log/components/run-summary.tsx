import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { StatusBadge } from '../../../components/ui/status-badge';
import { useUnitSystem } from '../../../lib/unit-system';
import { useRunSummaries } from '../api/gauge-queries';
import { formatMargin, formatThickness } from './format-gauge';

/** Per run: count, thinnest and thickest wet reading, share Over, worst margin. */
export function RunSummary({ revisionId, onPickRun }: { revisionId: string; onPickRun: (run: string) => void }) {
  const [system] = useUnitSystem();
  const runs = useRunSummaries(revisionId);
  if (runs.isPending) return <Loading label="Loading run summaries…" />;
  if (runs.isError) return <Notice tone="error" title="Could not load runs">{runs.error.message}</Notice>;
  if (runs.data.items.length === 0) return null;
  return (
    <section aria-labelledby="runs-heading" className="flex flex-col gap-2">
      <h2 id="runs-heading" className="text-lg font-semibold">
        Runs
      </h2>
      <div className="overflow-x-auto">
        <table className="min-w-full text-sm tabular-nums">
          <caption className="sr-only">Summary per run</caption>
          <thead>
            <tr className="border-b border-slate-line text-left text-ink-soft">
              <th className="py-2 pr-3">Run</th>
              <th className="pr-3">Readings</th>
              <th className="pr-3">Thinnest</th>
              <th className="pr-3">Thickest</th>
              <th className="pr-3">Close</th>
              <th className="pr-3">Over</th>
              <th className="pr-3">Share Over</th>
              <th>Worst margin</th>
            </tr>
          </thead>
          <tbody>
            {runs.data.items.map((r) => (
              <tr key={r.run} className="border-b border-slate-line/60">
                <td className="py-1.5 pr-3">
                  <button type="button" className="text-brand-dark underline-offset-2 hover:underline" onClick={() => onPickRun(r.run)}>
                    {r.run}
                  </button>
                </td>
                <td className="pr-3">{r.count.toLocaleString('en-GB')}</td>
                <td className="pr-3 whitespace-nowrap">{formatThickness(r.minThickness, system)}</td>
                <td className="pr-3 whitespace-nowrap">{formatThickness(r.maxThickness, system)}</td>
                <td className="pr-3">{r.closeCount}</td>
                <td className="pr-3">{r.overCount > 0 ? <StatusBadge tone="over">{`${r.overCount} Over`}</StatusBadge> : '0'}</td>
                <td className="pr-3">{(r.overShare * 100).toFixed(1)} %</td>
                <td>{formatMargin(r.worstMargin)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
