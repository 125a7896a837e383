import { getCoreRowModel, getExpandedRowModel, getSortedRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { OutboxMessage } from '../../../../shared/schemas/outbox';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/data-table';
import { EmailText } from '../../../components/ui/email-text';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';
import { formatDateTime } from '../../../utils/format';

const statusWords: Record<OutboxMessage['status'], { word: string; tone: StatusTone }> = {
  sent: { word: 'Sent', tone: 'quiet' },
  pending: { word: 'Waiting', tone: 'close' },
  failed: { word: 'Failed', tone: 'over' },
};

/** Outgoing mail, newest first; each row opens to show the plain-text body as it was sent. */
export function OutboxTable({ messages, busy }: { messages: OutboxMessage[]; busy?: boolean }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo<ColumnDef<OutboxMessage>[]>(
    () => [
      {
        id: 'expand',
        header: () => <span className="sr-only">Message text</span>,
        enableSorting: false,
        meta: { className: 'no-print' },
        cell: ({ row }) => (
          <Button
            size="sm"
            variant="quiet"
            aria-expanded={row.getIsExpanded()}
            aria-label={`${row.getIsExpanded() ? 'Hide' : 'Show'} text of “${row.original.subject}”`}
            onClick={row.getToggleExpandedHandler()}
          >
            <span aria-hidden="true">{row.getIsExpanded() ? '▾' : '▸'}</span> Text
          </Button>
        ),
      },
      { accessorKey: 'toAddress', header: 'To', cell: ({ getValue }) => <EmailText email={getValue<string>()} /> },
      { accessorKey: 'subject', header: 'Subject', cell: ({ getValue }) => <span className="font-medium">{getValue<string>()}</span> },
      { accessorKey: 'kind', header: 'Kind', meta: { className: 'hidden lg:table-cell print:table-cell' }, cell: ({ getValue }) => <code className="rounded bg-paper-sunk px-1.5 text-sm">{getValue<string>()}</code> },
      {
        accessorKey: 'status',
        header: 'Status',
        cell: ({ row }) => <StatusBadge tone={statusWords[row.original.status].tone}>{statusWords[row.original.status].word}</StatusBadge>,
      },
      { accessorKey: 'attempts', header: 'Attempts', meta: { className: 'hidden lg:table-cell print:table-cell' }, cell: ({ getValue }) => <span className="block text-right">{getValue<number>()}</span> },
      {
        accessorKey: 'lastError',
        header: 'Last error',
        cell: ({ getValue }) => {
          const value = getValue<string | null>();
          return value ? <span className="text-sm text-over">{value}</span> : <span className="text-ink-soft">None</span>;
        },
      },
      { accessorKey: 'createdAt', header: 'Created', cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDateTime(getValue<string>())}</span> },
      { accessorKey: 'sentAt', header: 'Sent', cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDateTime(getValue<string | null>())}</span> },
      {
        accessorKey: 'delivered',
        header: 'Delivered',
        cell: ({ getValue }) => (getValue<boolean>() ? <StatusBadge tone="quiet">Yes</StatusBadge> : <StatusBadge tone="neutral">No</StatusBadge>),
      },
    ],
    [],
  );
  const table = useReactTable({
    data: messages,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
    getRowCanExpand: () => true,
    getRowId: (message) => message.id,
  });
  return (
    <DataTable
      table={table}
      caption="Outgoing e-mail"
      busy={busy}
      renderExpanded={(row) => (
        <pre className="max-h-96 overflow-auto rounded-md border border-slate-line bg-paper-raised p-4 font-sans text-[0.95rem] whitespace-pre-wrap break-words">
          {row.original.textBody || '(This message has no text body.)'}
        </pre>
      )}
    />
  );
}
