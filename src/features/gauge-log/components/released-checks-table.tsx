import { Link } from 'react-router-dom';
import { processKindLabels } from '../../../../shared/schemas/layer-checks';
import type { ReleasedCheck } from '../../../../shared/schemas/gauge-log';
import { StatusBadge } from '../../../components/ui/status-badge';
import { useUnitSystem } from '../../../lib/unit-system';
import { formatDateTime } from '../../../utils/format';
import { formatMargin, formatThickness } from './format-gauge';

/** Signed sheet revisions that readings can be judged against. */
export function ReleasedChecksTable({ items }: { items: ReleasedCheck[] }) {
  const [system] = useUnitSystem();
  return (
    <div className="overflow-x-auto">
      <table className="min-w-full text-sm tabular-nums">
        <caption className="sr-only">Released checks</caption>
        <thead>
          <tr className="border-b border-slate-line text-left text-ink-soft">
            <th className="py-2 pr-3">Sheet</th>
            <th className="pr-3">Title</th>
            <th className="pr-3">Line</th>
            <th className="hidden pr-3 md:table-cell">Process</th>
            <th className="pr-3">Released thickness</th>
            <th className="hidden pr-3 md:table-cell">Margin</th>
            <th className="pr-3">Readings</th>
            <th className="pr-3">Over</th>
            <th className="hidden lg:table-cell">Last reading</th>
          </tr>
        </thead>
        <tbody>
          {items.map((c) => (
            <tr key={c.revisionId} className="border-b border-slate-line/60">
              <td className="py-2 pr-3 whitespace-nowrap">
                <Link to={`/gauge/${c.revisionId}`} className="font-medium text-brand-dark underline-offset-2 hover:underline">
                  {c.number} rev. {c.revision}
                </Link>
              </td>
              <td className="pr-3">{c.title}</td>
              <td className="pr-3">{c.line}</td>
              <td className="hidden pr-3 md:table-cell">{processKindLabels[c.processKind]}</td>
              <td className="pr-3 whitespace-nowrap">{formatThickness(c.checkThickness, system)}</td>
              <td className="hidden pr-3 md:table-cell">{formatMargin(c.checkMargin)}</td>
              <td className="pr-3">{c.readingCount.toLocaleString('en-GB')}</td>
              <td className="pr-3">{c.overCount > 0 ? <StatusBadge tone="over">{`${c.overCount} Over`}</StatusBadge> : '0'}</td>
              <td className="hidden lg:table-cell">{formatDateTime(c.lastReadingAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
