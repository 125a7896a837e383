import '@tanstack/react-table';

declare module '@tanstack/react-table' {
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Classes for this column's header and cells, e.g. to hide it on narrow screens or in print. */
    className?: string;
  }
}
