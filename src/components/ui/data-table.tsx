import { flexRender, type Row, type Table } from '@tanstack/react-table';
import { Fragment, type ReactNode } from 'react';
import { cn } from '../../utils/cn';

interface DataTableProps<T> {
  table: Table<T>;
  caption: string;
  /** Content shown in a full-width row under an expanded row. */
  renderExpanded?: (row: Row<T>) => ReactNode;
  /** Content shown under a row whatever its state (e.g. an error about that row). */
  renderRowNote?: (row: Row<T>) => ReactNode;
  busy?: boolean;
}

const sortMarks = { asc: '▲', desc: '▼' } as const;

/** A plain, readable table: sortable headers are buttons, numbers align, rows stay tall enough to tap. */
export function DataTable<T>({ table, caption, renderExpanded, renderRowNote, busy }: DataTableProps<T>) {
  const columnCount = table.getVisibleLeafColumns().length;
  return (
    <div className="overflow-x-auto rounded-md border border-slate-line bg-paper-raised print:overflow-visible" aria-busy={busy || undefined}>
      <table className={cn('w-full border-collapse text-left text-[0.95rem]', busy && 'opacity-70')}>
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const label = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    className={cn('border-b border-slate-line px-3 py-2.5 text-sm font-semibold whitespace-nowrap text-ink-soft', header.column.columnDef.meta?.className)}
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex min-h-8 items-center gap-1 rounded hover:text-ink"
                      >
                        {label}
                        <span aria-hidden="true" className="text-[0.7em] print:hidden">
                          {sorted ? sortMarks[sorted] : '↕'}
                        </span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => {
            const note = renderRowNote?.(row);
            return (
              <Fragment key={row.id}>
                <tr className={cn('border-b border-slate-line/70 align-middle last:border-b-0', row.getIsExpanded() && 'bg-brand-light/30')}>
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className={cn('px-3 py-2', cell.column.columnDef.meta?.className)}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
                {note && (
                  <tr>
                    <td colSpan={columnCount} className="px-3 pb-3">
                      {note}
                    </td>
                  </tr>
                )}
                {renderExpanded && row.getIsExpanded() && (
                  <tr className="border-b border-slate-line/70 bg-paper">
                    <td colSpan={columnCount} className="px-3 py-3">
                      {renderExpanded(row)}
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
