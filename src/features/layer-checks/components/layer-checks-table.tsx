import { getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { regimeLabels } from '../../../../shared/physics/stability/regime-labels';
import { processKindLabels, type LayerCheckSummary } from '../../../../shared/schemas/layer-checks';
import { DataTable } from '../../../components/ui/data-table';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';
import { paths } from '../../../config/paths';
import { formatInSystem, formatNumber, type UnitSystem } from '../../../lib/unit-system';
import { formatDateTime } from '../../../utils/format';

/** The saved margin's word (the list does not know each check's own alert threshold, so 1.25 is used). */
function savedMarginTone(margin: number | null): { tone: StatusTone; word: string } {
  if (margin === null) return { tone: 'quiet', word: 'Quiet' };
  if (margin >= 1.25) return { tone: 'quiet', word: 'Quiet' };
  if (margin >= 1) return { tone: 'close', word: 'Close' };
  return { tone: 'over', word: 'Over' };
}

/** The stored regime in words (the server stores the regime's code). */
function regimeLabel(saved: string | null): string {
  if (!saved) return '—';
  return (regimeLabels as Readonly<Record<string, string>>)[saved] ?? saved;
}

interface LayerChecksTableProps {
  checks: LayerCheckSummary[];
  system: UnitSystem;
  sorting: SortingState;
  onSortingChange: (sorting: SortingState) => void;
  busy?: boolean;
}

/** One page of layer checks, sorted by the server. */
export function LayerChecksTable({ checks, system, sorting, onSortingChange, busy }: LayerChecksTableProps) {
  const columns = useMemo<ColumnDef<LayerCheckSummary>[]>(
    () => [
      // The sortable columns carry an accessor: the table only offers a sort button for those (the
      // server does the sorting, by the column id).
      {
        id: 'title',
        header: 'Title',
        accessorFn: (check) => check.title,
        cell: ({ row }) => (
          <Link to={`${paths.layerChecks}/${row.original.id}`} className="font-medium text-brand-dark underline-offset-2 hover:underline">
            {row.original.title}
          </Link>
        ),
      },
      { id: 'processKind', header: 'Process', accessorFn: (check) => check.processKind, cell: ({ row }) => processKindLabels[row.original.processKind] },
      { id: 'fluid', header: 'Fluid', enableSorting: false, meta: { className: 'hidden md:table-cell' }, cell: ({ row }) => row.original.fluidName },
      { id: 'depth', header: 'Depth', accessorFn: (check) => check.depthSi, meta: { className: 'text-right whitespace-nowrap tabular-nums' }, cell: ({ row }) => formatInSystem(row.original.depthSi, 'length', system, 3) },
      {
        id: 'margin',
        header: 'Saved margin',
        accessorFn: (check) => check.savedMargin,
        meta: { className: 'whitespace-nowrap' },
        cell: ({ row }) => {
          const { tone, word } = savedMarginTone(row.original.savedMargin);
          return (
            <span className="flex items-center gap-2">
              <span className="tabular-nums">{row.original.savedMargin === null ? 'no onset' : `${formatNumber(row.original.savedMargin, 3)}×`}</span>
              <StatusBadge tone={tone}>{word}</StatusBadge>
            </span>
          );
        },
      },
      { id: 'regime', header: 'Regime', enableSorting: false, meta: { className: 'hidden lg:table-cell' }, cell: ({ row }) => regimeLabel(row.original.savedRegime) },
      { id: 'owner', header: 'Owner', enableSorting: false, meta: { className: 'hidden xl:table-cell' }, cell: ({ row }) => row.original.ownerName ?? '—' },
      { id: 'revision', header: 'Rev.', enableSorting: false, meta: { className: 'text-right tabular-nums' }, cell: ({ row }) => row.original.revision },
      { id: 'updatedAt', header: 'Saved', accessorFn: (check) => check.updatedAt, meta: { className: 'hidden lg:table-cell whitespace-nowrap' }, cell: ({ row }) => formatDateTime(row.original.updatedAt) },
    ],
    [system],
  );
  const table = useReactTable({
    data: checks,
    columns,
    state: { sorting },
    manualSorting: true,
    enableSortingRemoval: false,
    onSortingChange: (updater) => onSortingChange(typeof updater === 'function' ? updater(sorting) : updater),
    getCoreRowModel: getCoreRowModel(),
    getRowId: (check) => check.id,
  });
  return <DataTable table={table} caption="Layer checks" busy={busy} />;
}
