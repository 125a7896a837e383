import { getCoreRowModel, getSortedRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { roleLabels, roleValues, type Role } from '../../../../shared/schemas/roles';
import type { User } from '../../../../shared/schemas/users';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/data-table';
import { EmailText } from '../../../components/ui/email-text';
import { Notice } from '../../../components/ui/notice';
import { StatusBadge } from '../../../components/ui/status-badge';
import { formatDateTime } from '../../../utils/format';
import { useUpdateUser } from '../api/update-user';

interface UsersTableProps {
  users: User[];
  currentUserId: string;
  busy?: boolean;
}

/** The people on this site. Role and active state change per row; the server's refusal shows under that row. */
export function UsersTable({ users, currentUserId, busy }: UsersTableProps) {
  const update = useUpdateUser();
  const { mutate } = update;
  const [sorting, setSorting] = useState<SortingState>([]);
  const [rowErrors, setRowErrors] = useState<Record<string, string>>({});
  const [confirmingId, setConfirmingId] = useState<string>();

  const pendingId = update.isPending ? update.variables?.id : undefined;

  const columns = useMemo<ColumnDef<User>[]>(() => {
    const change = (user: User, changes: { role?: Role; active?: boolean }) => {
      setRowErrors(({ [user.id]: _dropped, ...rest }) => rest);
      setConfirmingId(undefined);
      mutate(
        { id: user.id, changes },
        { onError: (error) => setRowErrors((current) => ({ ...current, [user.id]: error.message })) },
      );
    };
    return [
      {
        accessorKey: 'displayName',
        header: 'Name',
        cell: ({ row }) => (
          <span className="font-medium">
            {row.original.displayName}
            {row.original.id === currentUserId && <span className="ml-2 rounded bg-brand-light px-1.5 py-0.5 text-xs font-semibold text-brand-dark">you</span>}
          </span>
        ),
      },
      { accessorKey: 'email', header: 'E-mail', cell: ({ getValue }) => <EmailText email={getValue<string>()} /> },
      {
        accessorKey: 'role',
        header: 'Role',
        sortingFn: (a, b) => roleLabels[a.original.role].localeCompare(roleLabels[b.original.role]),
        cell: ({ row }) => {
          const user = row.original;
          return (
            <select
              aria-label={`Role of ${user.displayName}`}
              value={user.role}
              disabled={pendingId === user.id}
              onChange={(event) => change(user, { role: event.target.value as Role })}
              className="min-h-10 rounded-md border border-slate-line bg-paper-raised px-2 text-[0.95rem]"
            >
              {roleValues.map((role) => (
                <option key={role} value={role}>
                  {roleLabels[role]}
                </option>
              ))}
            </select>
          );
        },
      },
      {
        accessorKey: 'active',
        header: 'Status',
        cell: ({ row }) => (row.original.active ? <StatusBadge tone="quiet">Active</StatusBadge> : <StatusBadge tone="neutral">Deactivated</StatusBadge>),
      },
      { accessorKey: 'createdAt', header: 'Added', meta: { className: 'hidden xl:table-cell' }, cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDateTime(getValue<string>())}</span> },
      {
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { className: 'no-print' },
        enableSorting: false,
        cell: ({ row }) => {
          const user = row.original;
          if (user.id === currentUserId) return <span className="text-sm text-ink-soft">Signed in now</span>;
          if (!user.active) {
            return (
              <Button size="sm" variant="secondary" busy={pendingId === user.id} onClick={() => change(user, { active: true })}>
                Reactivate
              </Button>
            );
          }
          if (confirmingId === user.id) {
            return (
              <span className="flex flex-wrap gap-2">
                <Button size="sm" variant="danger" busy={pendingId === user.id} onClick={() => change(user, { active: false })}>
                  Confirm deactivate
                </Button>
                <Button size="sm" variant="quiet" onClick={() => setConfirmingId(undefined)}>
                  Cancel
                </Button>
              </span>
            );
          }
          return (
            <Button size="sm" variant="secondary" aria-label={`Deactivate ${user.displayName}`} onClick={() => setConfirmingId(user.id)}>
              Deactivate
            </Button>
          );
        },
      },
    ];
  }, [currentUserId, pendingId, confirmingId, mutate]);

  const table = useReactTable({
    data: users,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (user) => user.id,
  });

  return (
    <DataTable
      table={table}
      caption="Users of this QuietLayer site"
      busy={busy}
      renderRowNote={(row) =>
        rowErrors[row.id] ? (
          <Notice tone="error" title={`Not changed: ${row.original.displayName}`}>
            {rowErrors[row.id]}
          </Notice>
        ) : null
      }
    />
  );
}
