import { getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { fluidKindLabels, type FluidSummary } from '../../../../shared/schemas/fluids';
import { DataTable } from '../../../components/ui/data-table';
import { StatusBadge } from '../../../components/ui/status-badge';
import { paths } from '../../../config/paths';
import { formatInSystem, type UnitSystem } from '../../../lib/unit-system';
import { formatDateTime } from '../../../utils/format';

interface FluidsTableProps {
  fluids: FluidSummary[];
  system: UnitSystem;
  sorting: SortingState;
  onSortingChange: (sorting: SortingState) => void;
  busy?: boolean;
}

const numberCell = 'text-right whitespace-nowrap tabular-nums';
/** A real minus sign, which lines up with the digits. */
const minus = (text: string) => text.replace(/^-/, '−');

/**
 * One page of the fluid library. Sorting is done by the server (the whole library, not just this
 * page), so the header buttons change the URL and the list is fetched again.
 */
export function FluidsTable({ fluids, system, sorting, onSortingChange, busy }: FluidsTableProps) {
  const columns = useMemo<ColumnDef<FluidSummary>[]>(
    () => [
      {
        id: 'name',
        accessorKey: 'name',
        header: 'Name',
        cell: ({ row }) => (
          <span className="flex min-w-44 flex-wrap items-center gap-2">
            <Link to={`${paths.fluids}/${row.original.id}`} className="font-medium text-brand-dark underline-offset-2 hover:underline">
              {row.original.name}
            </Link>
            {row.original.archived && <StatusBadge tone="neutral">Archived</StatusBadge>}
          </span>
        ),
      },
      { id: 'kind', accessorKey: 'kind', header: 'Kind', cell: ({ row }) => fluidKindLabels[row.original.kind] },
      {
        id: 'density',
        header: 'Density',
        meta: { className: numberCell },
        cell: ({ row }) => formatInSystem(row.original.density, 'density', system),
      },
      {
        id: 'viscosity',
        header: 'Viscosity at T₀',
        meta: { className: numberCell },
        cell: ({ row }) => formatInSystem(row.original.viscosity, 'dynamicViscosity', system),
      },
      {
        id: 'surfaceTension',
        header: 'Surface tension',
        meta: { className: numberCell },
        cell: ({ row }) => formatInSystem(row.original.surfaceTension, 'surfaceTension', system),
      },
      {
        id: 'surfaceTensionSlope',
        header: 'dσ/dT',
        enableSorting: false,
        meta: { className: `${numberCell} hidden lg:table-cell` },
        cell: ({ row }) => minus(formatInSystem(row.original.surfaceTensionSlope, 'surfaceTensionSlope', system)),
      },
      {
        id: 'referenceTemperature',
        header: 'T₀',
        enableSorting: false,
        meta: { className: `${numberCell} hidden md:table-cell` },
        cell: ({ row }) => formatInSystem(row.original.referenceTemperature, 'temperature', system),
      },
      {
        id: 'updatedAt',
        header: 'Updated',
        meta: { className: 'hidden 2xl:table-cell whitespace-nowrap' },
        cell: ({ row }) => formatDateTime(row.original.updatedAt),
      },
    ],
    [system],
  );

  const table = useReactTable({
    data: fluids,
    columns,
    state: { sorting },
    manualSorting: true,
    enableSortingRemoval: false,
    onSortingChange: (updater) => onSortingChange(typeof updater === 'function' ? updater(sorting) : updater),
    getCoreRowModel: getCoreRowModel(),
    getRowId: (fluid) => fluid.id,
  });

  return <DataTable table={table} caption="Fluids in the library" busy={busy} />;
}
