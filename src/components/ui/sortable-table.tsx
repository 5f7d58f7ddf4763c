import { flexRender, type Row, type Table } from "@tanstack/react-table";
import clsx from "clsx";

type SortableTableProps<T> = {
  table: Table<T>;
  /** The rows to draw (already sorted or filtered by the caller). */
  rows: Row<T>[];
  /** Read by screen readers: what the table lists and how to sort it. */
  caption: string;
  className?: string;
};

/** The desk view of a TanStack table: every column heading is a button that sorts by it, with aria-sort. */
export function SortableTable<T>({ table, rows, caption, className }: SortableTableProps<T>) {
  return (
    <div className={clsx("hidden overflow-x-auto bg-white ring-1 ring-ink-900/10 md:block", className)}>
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-ink-900/10 bg-ink-50/60">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const dir = h.column.getIsSorted();
                return (
                  <th
                    key={h.id}
                    scope="col"
                    aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : "none"}
                    className="px-3 py-2 font-semibold whitespace-nowrap text-ink-700"
                  >
                    <button
                      type="button"
                      onClick={h.column.getToggleSortingHandler()}
                      className="inline-flex min-h-9 items-center gap-1 rounded hover:text-ink-900"
                    >
                      {flexRender(h.column.columnDef.header, h.getContext())}
                      <span aria-hidden="true" className="text-ink-400">
                        {dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}
                      </span>
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-ink-900/5">
          {rows.map((row) => (
            <tr key={row.id} className="hover:bg-sand-50">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2.5 align-middle whitespace-nowrap">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
