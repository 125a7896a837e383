import { getCoreRowModel, getExpandedRowModel, getSortedRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { AuditEvent } from '../../../../shared/schemas/audit';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/data-table';
import { EmailText } from '../../../components/ui/email-text';
import { formatDateTime } from '../../../utils/format';
import { changedKeys } from './changed-keys';

function Snapshot({ title, value }: { title: string; value: unknown }) {
  return (
    <div className="min-w-0">
      <h3 className="mb-1 text-sm font-semibold text-ink-soft">{title}</h3>
      {value === null || value === undefined ? (
        <p className="rounded-md border border-dashed border-slate-line px-3 py-2 text-sm text-ink-soft">Nothing recorded</p>
      ) : (
        <pre className="max-h-80 overflow-auto rounded-md border border-slate-line bg-paper-raised p-3 text-[0.85rem] leading-relaxed whitespace-pre-wrap break-words">
          {JSON.stringify(value, null, 2)}
        </pre>
      )}
    </div>
  );
}

function EventDetail({ event }: { event: AuditEvent }) {
  const changed = changedKeys(event.before, event.after);
  return (
    <div className="flex flex-col gap-3">
      {changed.length > 0 && (
        <p className="text-sm">
          <span className="font-semibold">Changed:</span>{' '}
          {changed.map((key) => (
            <code key={key} className="mr-1.5 rounded bg-close-light px-1.5 text-ink">
              {key}
            </code>
          ))}
        </p>
      )}
      <div className="grid gap-3 md:grid-cols-2">
        <Snapshot title="Before" value={event.before} />
        <Snapshot title="After" value={event.after} />
      </div>
      <p className="text-sm text-ink-soft">
        Event {event.id}
        {event.requestId && <> · request <code>{event.requestId}</code></>}
      </p>
    </div>
  );
}

/** The trail itself: who did what to which record, when; each row opens to show before and after. */
export function AuditTable({ events, busy }: { events: AuditEvent[]; busy?: boolean }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo<ColumnDef<AuditEvent>[]>(
    () => [
      {
        id: 'expand',
        header: () => <span className="sr-only">Details</span>,
        enableSorting: false,
        meta: { className: 'no-print' },
        cell: ({ row }) => (
          <Button
            size="sm"
            variant="quiet"
            aria-expanded={row.getIsExpanded()}
            aria-label={`${row.getIsExpanded() ? 'Hide' : 'Show'} details of event ${row.original.id}`}
            onClick={row.getToggleExpandedHandler()}
          >
            <span aria-hidden="true">{row.getIsExpanded() ? '▾' : '▸'}</span> Details
          </Button>
        ),
      },
      { accessorKey: 'occurredAt', header: 'When', cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDateTime(getValue<string>())}</span> },
      {
        accessorKey: 'actorEmail',
        header: 'Actor',
        cell: ({ getValue }) => {
          const email = getValue<string | null>();
          return email ? <EmailText email={email} /> : <span className="text-ink-soft">System</span>;
        },
      },
      { accessorKey: 'action', header: 'Action', cell: ({ getValue }) => <code className="rounded bg-paper-sunk px-1.5 text-sm">{getValue<string>()}</code> },
      {
        accessorKey: 'entityType',
        header: 'Entity',
        cell: ({ row }) => (
          <span>
            {row.original.entityType}
            {row.original.entityId && <span className="block max-w-48 truncate text-sm text-ink-soft" title={row.original.entityId}>{row.original.entityId}</span>}
          </span>
        ),
      },
      {
        accessorKey: 'reason',
        header: 'Reason',
        meta: { className: 'hidden md:table-cell print:table-cell' },
        cell: ({ getValue }) => getValue<string | null>() ?? <span className="text-ink-soft">—</span>,
      },
    ],
    [],
  );
  const table = useReactTable({
    data: events,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
    getRowCanExpand: () => true,
    getRowId: (event) => String(event.id),
  });
  return <DataTable table={table} caption="Audit trail events" busy={busy} renderExpanded={(row) => <EventDetail event={row.original} />} />;
}
