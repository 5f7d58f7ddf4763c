import { formatDate, formatStimp } from "#shared/format";
import { useMemo, useState } from "react";
import {
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type PaginationState,
  type SortingState,
  type Updater,
} from "@tanstack/react-table";
import type { SessionItem } from "#shared/schemas/sessions";
import { Alert, ButtonLink, ConfirmDialog, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { errorMessage } from "../../../lib/query-client";
import { useDeleteSession } from "../api/delete-session";
import { useGreens } from "../api/get-greens";
import { useSessions } from "../api/get-sessions";
import { percent } from "../utils/putt-text";
import { fromSorting, pageCount, sessionParams, toSorting, withChanges } from "../utils/table-query";
import { DataTable } from "./data-table";
import { DateRangeFilter, FilterBar, SelectFilter } from "./table-filters";

export type SessionsTableProps = { query: URLSearchParams; onQueryChange: (next: URLSearchParams) => void };

/** Every session, sorted, filtered and paged by the server; the state lives in the URL. */
export function SessionsTable({ query, onQueryChange }: SessionsTableProps) {
  const params = sessionParams(query);
  const sessions = useSessions(params);
  const greens = useGreens();
  const remove = useDeleteSession();
  const [confirm, setConfirm] = useState<SessionItem | null>(null);

  const columns = useMemo<ColumnDef<SessionItem>[]>(
    () => [
      {
        id: "date",
        header: "Day",
        sortDescFirst: true,
        cell: ({ row }) => (
          <TextLink to={paths.session.href(row.original.id)} className="whitespace-nowrap">
            {formatDate(row.original.date)}
          </TextLink>
        ),
      },
      { id: "putts", header: "Putts", sortDescFirst: true, meta: { align: "right" }, cell: ({ row }) => row.original.putts },
      {
        id: "makeRate",
        header: "Make rate",
        sortDescFirst: true,
        meta: { align: "right" },
        cell: ({ row }) => (
          <span className="whitespace-nowrap">
            {percent(row.original.makeRate)}
            <span className="block text-xs text-ink-500">{row.original.holed} holed</span>
          </span>
        ),
      },
      {
        id: "green",
        header: "Green",
        enableSorting: false,
        cell: ({ row }) => row.original.greenName ?? <span className="text-ink-400">none</span>,
      },
      {
        id: "stimp",
        header: "Stimp",
        enableSorting: false,
        meta: { align: "right" },
        cell: ({ row }) => (row.original.stimpFt === null ? "–" : formatStimp(row.original.stimpFt)),
      },
      {
        id: "tags",
        header: "Conditions",
        enableSorting: false,
        cell: ({ row }) => (
          <span className="line-clamp-2 text-ink-600">
            {[row.original.conditions, ...row.original.tags].filter(Boolean).join(" · ") || "–"}
          </span>
        ),
      },
      {
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => (
          <div className="flex justify-end gap-1">
            <ButtonLink
              to={paths.session.href(row.original.id)}
              variant="ghost"
              size="sm"
              aria-label={`Open the session of ${formatDate(row.original.date)}`}
            >
              Open
            </ButtonLink>
            <button
              type="button"
              onClick={() => setConfirm(row.original)}
              className="min-h-11 rounded-lg px-3 text-sm font-medium text-bad-600 hover:bg-bad-50"
              aria-label={`Delete the session of ${formatDate(row.original.date)}`}
            >
              Delete
            </button>
          </div>
        ),
      },
    ],
    [],
  );

  const total = sessions.data?.total ?? 0;
  const sorting: SortingState = toSorting(params.sort);
  const pagination: PaginationState = { pageIndex: params.page - 1, pageSize: params.pageSize };
  const table = useReactTable({
    data: sessions.data?.items ?? [],
    columns,
    getRowId: (r) => r.id,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    pageCount: pageCount(total, params.pageSize),
    state: { sorting, pagination },
    onSortingChange: (u: Updater<SortingState>) => {
      const next = typeof u === "function" ? u(sorting) : u;
      onQueryChange(withChanges(query, { sort: fromSorting(next, "-date") }));
    },
    onPaginationChange: (u: Updater<PaginationState>) => {
      const next = typeof u === "function" ? u(pagination) : u;
      onQueryChange(withChanges(query, { page: next.pageIndex + 1 }));
    },
  });

  const greenOptions = [{ value: "", label: "All greens" }, ...(greens.data?.items ?? []).map((g) => ({ value: g.id, label: g.name }))];
  const activeFilters = [params.from, params.to, params.greenId].filter(Boolean).length;

  return (
    <div className="flex flex-col gap-4">
      <FilterBar
        active={activeFilters}
        onClear={() => onQueryChange(withChanges(query, { from: undefined, to: undefined, green: undefined }))}
      >
        <DateRangeFilter from={params.from} to={params.to} onChange={(from, to) => onQueryChange(withChanges(query, { from, to }))} />
        <SelectFilter
          label="Green"
          value={params.greenId ?? ""}
          options={greenOptions}
          onChange={(v) => onQueryChange(withChanges(query, { green: v || undefined }))}
        />
      </FilterBar>
      {sessions.isError ? (
        <Alert tone="error" title="Could not load your sessions">
          {errorMessage(sessions.error)}
        </Alert>
      ) : null}
      <DataTable
        table={table}
        caption="Practice sessions"
        fetching={sessions.isFetching}
        total={total}
        noun={["session", "sessions"]}
        empty={activeFilters > 0 ? "No session matches these filters." : "No sessions yet. Start one above, or import a CSV of putts."}
      />
      <ConfirmDialog
        open={confirm !== null}
        title="Delete this session?"
        confirmLabel="Delete session"
        busy={remove.isPending}
        onCancel={() => setConfirm(null)}
        onConfirm={() => confirm && remove.mutate(confirm.id, { onSettled: () => setConfirm(null) })}
      >
        {confirm
          ? `The session of ${formatDate(confirm.date)} and its ${confirm.putts} ${confirm.putts === 1 ? "putt" : "putts"} will be gone for good.`
          : null}
      </ConfirmDialog>
    </div>
  );
}
