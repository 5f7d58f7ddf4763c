import type { ReactNode } from "react";
import { flexRender, type Table } from "@tanstack/react-table";
import clsx from "clsx";
import { Button, Spinner, TableScroller } from "../../../components/ui";

export type DataTableProps<T> = {
  table: Table<T>;
  caption: string;
  /** A refetch (new page, sort, filter) is under way; the old rows stay until it lands. */
  fetching?: boolean;
  total: number;
  noun: [one: string, many: string];
  empty: ReactNode;
};

function SortIcon({ dir }: { dir: false | "asc" | "desc" }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 12 16" className={clsx("size-3.5 shrink-0 fill-current", dir ? "text-ink-900" : "text-ink-300")}>
      <path d="M6 1 10 6H2z" opacity={dir === "desc" ? 0.25 : 1} />
      <path d="M6 15 2 10h8z" opacity={dir === "asc" ? 0.25 : 1} />
    </svg>
  );
}

/** A server-driven table: sorting and paging are TanStack Table state that the caller keeps in the URL. */
export function DataTable<T>({ table, caption, fetching = false, total, noun, empty }: DataTableProps<T>) {
  const { pageIndex, pageSize } = table.getState().pagination;
  const pages = table.getPageCount();
  const first = total === 0 ? 0 : pageIndex * pageSize + 1;
  const last = Math.min(total, (pageIndex + 1) * pageSize);
  const rows = table.getRowModel().rows;

  return (
    <div className="flex flex-col gap-3">
      <TableScroller label={caption} className="relative" aria-busy={fetching || undefined}>
        <table className="w-full min-w-[36rem] border-collapse bg-white text-left text-sm">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-ink-50 text-ink-700">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sortable = header.column.getCanSort();
                  const dir = header.column.getIsSorted();
                  const label = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : sortable ? "none" : undefined}
                      className={clsx(
                        "px-3 py-2 font-semibold whitespace-nowrap first:pl-4",
                        (header.column.columnDef.meta as { align?: string } | undefined)?.align === "right" && "text-right",
                      )}
                    >
                      {sortable ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="-mx-1 inline-flex min-h-11 items-center gap-1.5 rounded-md px-1 hover:text-ink-900"
                        >
                          {label}
                          <SortIcon dir={dir} />
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
          <tbody className={clsx(fetching && "opacity-60 transition-opacity")}>
            {rows.map((row) => (
              <tr key={row.id} className="border-t border-ink-900/5 hover:bg-sand-50">
                {row.getVisibleCells().map((cell) => (
                  <td
                    key={cell.id}
                    className={clsx(
                      "px-3 py-2 align-middle first:pl-4",
                      (cell.column.columnDef.meta as { align?: string } | undefined)?.align === "right" && "text-right tabular-nums",
                    )}
                  >
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 && !fetching ? <div className="bg-white px-4 py-8 text-center text-ink-500">{empty}</div> : null}
        {fetching ? (
          <div className="absolute top-2 right-3">
            <Spinner size="sm" label="Updating" />
          </div>
        ) : null}
      </TableScroller>
      <nav aria-label={`${caption}: pages`} className="flex flex-wrap items-center justify-between gap-2 text-sm text-ink-600">
        <p aria-live="polite">
          {total === 0 ? `No ${noun[1]}` : `${first}–${last} of ${total} ${total === 1 ? noun[0] : noun[1]}`}
          {pages > 1 ? ` · page ${pageIndex + 1} of ${pages}` : ""}
        </p>
        <div className="flex gap-2">
          <Button variant="secondary" size="sm" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
            Previous
          </Button>
          <Button variant="secondary" size="sm" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
            Next
          </Button>
        </div>
      </nav>
    </div>
  );
}
