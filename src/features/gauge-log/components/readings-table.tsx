import { gaugeFlagLabels, gaugeFlagValues, type GaugeFlag } from '../../../../shared/schemas/gauge-log';
import { Field, Input, Select } from '../../../components/ui/field';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { Pagination } from '../../../components/ui/pagination';
import { useUnitSystem } from '../../../lib/unit-system';
import { formatDateTime } from '../../../utils/format';
import { useReadings, type ReadingParams } from '../api/gauge-queries';
import { FlagBadge } from './flag-badge';
import { formatMargin, formatTemperature, formatThickness } from './format-gauge';

/** Judged readings, paged on the server, filtered by flag and run. */
export function ReadingsTable({
  revisionId,
  params,
  onParams,
}: {
  revisionId: string;
  params: ReadingParams;
  onParams: (next: Partial<ReadingParams>) => void;
}) {
  const [system] = useUnitSystem();
  const readings = useReadings(revisionId, params);
  return (
    <section aria-labelledby="readings-heading" className="flex flex-col gap-3">
      <h2 id="readings-heading" className="text-lg font-semibold">
        Readings
      </h2>
      <div className="no-print grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Verdict">
          {({ id }) => (
            <Select id={id} value={params.flag ?? ''} onChange={(e) => onParams({ flag: (e.target.value || undefined) as GaugeFlag | undefined, page: 1 })}>
              <option value="">Any verdict</option>
              {gaugeFlagValues.map((f) => (
                <option key={f} value={f}>
                  {gaugeFlagLabels[f]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Run">
          {({ id }) => <Input id={id} value={params.run ?? ''} placeholder="All runs" onChange={(e) => onParams({ run: e.target.value || undefined, page: 1 })} />}
        </Field>
      </div>
      {readings.isPending ? (
        <Loading label="Loading readings…" />
      ) : readings.isError ? (
        <Notice tone="error" title="Could not load readings">
          {readings.error.message}
        </Notice>
      ) : readings.data.total === 0 ? (
        <p className="text-ink-soft">No readings match. Upload a gauge file above, or let the gauge post with its token.</p>
      ) : (
        <>
          <div className="overflow-x-auto">
            <table className="min-w-full text-sm tabular-nums" aria-busy={readings.isPlaceholderData || undefined}>
              <caption className="sr-only">Judged readings</caption>
              <thead>
                <tr className="border-b border-slate-line text-left text-ink-soft">
                  <th className="py-2 pr-3">#</th>
                  <th className="pr-3">Run</th>
                  <th className="pr-3">Position / time</th>
                  <th className="hidden pr-3 md:table-cell">Dir.</th>
                  <th className="pr-3">As entered</th>
                  <th className="pr-3">Wet thickness</th>
                  <th className="hidden pr-3 lg:table-cell">Substrate / air</th>
                  <th className="pr-3">Margin</th>
                  <th className="pr-3">Verdict</th>
                  <th className="hidden lg:table-cell">Operator · source</th>
                </tr>
              </thead>
              <tbody>
                {readings.data.items.map((r) => (
                  <tr key={r.id} className="border-b border-slate-line/60">
                    <td className="py-1.5 pr-3 text-ink-soft">{r.sequence}</td>
                    <td className="pr-3">{r.run}</td>
                    <td className="pr-3 whitespace-nowrap">{r.position !== null ? `${r.position.toPrecision(4)} m` : formatDateTime(r.measuredAt)}</td>
                    <td className="hidden pr-3 md:table-cell">{r.direction ? r.direction.toUpperCase() : '—'}</td>
                    <td className="pr-3 whitespace-nowrap">
                      {r.enteredThickness} {r.enteredUnit}
                    </td>
                    <td className="pr-3 whitespace-nowrap">{formatThickness(r.wetThickness, system)}</td>
                    <td className="hidden pr-3 whitespace-nowrap lg:table-cell">
                      {r.substrateTemperature === null && r.airTemperature === null
                        ? '—'
                        : `${formatTemperature(r.substrateTemperature, system)} / ${formatTemperature(r.airTemperature, system)}`}
                    </td>
                    <td className="pr-3 whitespace-nowrap">{formatMargin(r.margin)}</td>
                    <td className="pr-3">
                      <FlagBadge flag={r.flag} />
                    </td>
                    <td className="hidden text-ink-soft lg:table-cell">
                      {r.operator ?? '—'} · {r.source === 'device' ? 'gauge post' : 'upload'}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <Pagination
            label="Readings"
            page={readings.data.page}
            pageSize={readings.data.pageSize}
            total={readings.data.total}
            busy={readings.isFetching}
            onPageChange={(page) => onParams({ page })}
          />
        </>
      )}
    </section>
  );
}
