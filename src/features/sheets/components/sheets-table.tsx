import { getCoreRowModel, useReactTable, type ColumnDef } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { processKindLabels } from '../../../../shared/schemas/layer-checks';
import type { SheetSummary } from '../../../../shared/schemas/sheets';
import { DataTable } from '../../../components/ui/data-table';
import { formatNumber } from '../../../lib/unit-system';
import { formatDateTime } from '../../../utils/format';
import { SheetStateBadge } from './sheet-state-badge';

/** One page of process sheets (a row per revision). */
export function SheetsTable({ sheets, busy }: { sheets: SheetSummary[]; busy?: boolean }) {
  const columns = useMemo<ColumnDef<SheetSummary>[]>(
    () => [
      {
        id: 'number',
        header: 'Sheet',
        cell: ({ row }) => (
          <Link to={`/sheets/${row.original.id}`} className="font-medium whitespace-nowrap text-brand-dark underline-offset-2 hover:underline">
            {row.original.number} rev. {row.original.revision}
          </Link>
        ),
      },
      { id: 'title', header: 'Title', cell: ({ row }) => row.original.title },
      { id: 'line', header: 'Line', cell: ({ row }) => row.original.line },
      { id: 'state', header: 'State', cell: ({ row }) => <SheetStateBadge state={row.original.state} /> },
      {
        id: 'margin',
        header: 'Margin',
        meta: { className: 'hidden md:table-cell text-right tabular-nums whitespace-nowrap' },
        cell: ({ row }) => (row.original.margin === null ? 'no onset' : `${formatNumber(row.original.margin, 3)}×`),
      },
      { id: 'kind', header: 'Process', meta: { className: 'hidden lg:table-cell' }, cell: ({ row }) => processKindLabels[row.original.processKind] },
      { id: 'author', header: 'Author', meta: { className: 'hidden md:table-cell' }, cell: ({ row }) => row.original.authorName },
      { id: 'createdAt', header: 'Made', meta: { className: 'hidden lg:table-cell whitespace-nowrap' }, cell: ({ row }) => formatDateTime(row.original.createdAt) },
    ],
    [],
  );
  const table = useReactTable({ data: sheets, columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.id });
  return <DataTable table={table} caption="Process sheets" busy={busy} />;
}
