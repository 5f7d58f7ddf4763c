import { formatDate } from "#shared/format";
import { useMemo, useState } from "react";
import {
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type PaginationState,
  type SortingState,
  type Updater,
} from "@tanstack/react-table";
import { BREAK_TYPES, type Putt } from "#shared/schemas/putts";
import { formatLength, type UnitSystem } from "#shared/units";
import { Alert, ConfirmDialog, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { errorMessage } from "../../../lib/query-client";
import { useDeletePutt } from "../api/delete-putt";
import { usePutts } from "../api/get-putts";
import { BREAK_LABELS, missText } from "../utils/putt-text";
import { fromSorting, pageCount, puttParams, toSorting, withChanges } from "../utils/table-query";
import { DataTable } from "./data-table";
import { DateRangeFilter, DistanceRangeFilter, FilterBar, SelectFilter } from "./table-filters";

export type PuttsTableProps = { query: URLSearchParams; onQueryChange: (next: URLSearchParams) => void; units: UnitSystem };

/** Every putt, sorted, filtered and paged by the server; the state lives in the URL. */
export function PuttsTable({ query, onQueryChange, units }: PuttsTableProps) {
  const params = puttParams(query);
  const putts = usePutts(params);
  const remove = useDeletePutt();
  const [confirm, setConfirm] = useState<Putt | null>(null);

  const columns = useMemo<ColumnDef<Putt>[]>(
    () => [
      {
        id: "date",
        header: "Day",
        sortDescFirst: true,
        cell: ({ row }) => <span className="whitespace-nowrap">{formatDate(row.original.date)}</span>,
      },
      {
        id: "distance",
        header: "Distance",
        meta: { align: "right" },
        cell: ({ row }) => <span className="whitespace-nowrap">{formatLength(row.original.distanceM, units)}</span>,
      },
      {
        id: "result",
        header: "Result",
        enableSorting: false,
        cell: ({ row }) =>
          row.original.holed ? (
            <span className="font-medium text-ok-800">Holed</span>
          ) : (
            <span>
              Missed{missText(row.original, units) ? <span className="text-ink-500"> · {missText(row.original, units)}</span> : null}
            </span>
          ),
      },
      {
        id: "break",
        header: "Break",
        enableSorting: false,
        cell: ({ row }) => (row.original.breakType ? BREAK_LABELS[row.original.breakType] : "–"),
      },
      {
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => (
          <div className="flex items-center justify-end gap-1">
            <TextLink to={paths.session.href(row.original.sessionId)} className="px-2 text-sm whitespace-nowrap">
              Session
            </TextLink>
            <button
              type="button"
              onClick={() => setConfirm(row.original)}
              className="min-h-11 rounded-lg px-3 text-sm font-medium text-bad-600 hover:bg-bad-50"
              aria-label={`Delete the ${formatLength(row.original.distanceM, units)} putt of ${formatDate(row.original.date)}`}
            >
              Delete
            </button>
          </div>
        ),
      },
    ],
    [units],
  );

  const total = putts.data?.total ?? 0;
  const sorting: SortingState = toSorting(params.sort);
  const pagination: PaginationState = { pageIndex: params.page - 1, pageSize: params.pageSize };
  const table = useReactTable({
    data: putts.data?.items ?? [],
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
    onSortingChange: (u: Updater<SortingState>) =>
      onQueryChange(withChanges(query, { sort: fromSorting(typeof u === "function" ? u(sorting) : u, "-date") })),
    onPaginationChange: (u: Updater<PaginationState>) =>
      onQueryChange(withChanges(query, { page: (typeof u === "function" ? u(pagination) : u).pageIndex + 1 })),
  });

  const active = [params.from, params.to, params.holed, params.breakType, params.minM, params.maxM].filter((v) => v !== undefined).length;

  return (
    <div className="flex flex-col gap-4">
      <FilterBar
        active={active}
        onClear={() =>
          onQueryChange(
            withChanges(query, { from: undefined, to: undefined, holed: undefined, break: undefined, minM: undefined, maxM: undefined }),
          )
        }
      >
        <DateRangeFilter from={params.from} to={params.to} onChange={(from, to) => onQueryChange(withChanges(query, { from, to }))} />
        <SelectFilter
          label="Result"
          value={params.holed ?? ""}
          options={[
            { value: "", label: "Holed and missed" },
            { value: "true", label: "Holed only" },
            { value: "false", label: "Missed only" },
          ]}
          onChange={(v) => onQueryChange(withChanges(query, { holed: v || undefined }))}
        />
        <SelectFilter
          label="Break"
          value={params.breakType ?? ""}
          options={[{ value: "", label: "Any break" }, ...BREAK_TYPES.map((b) => ({ value: b, label: BREAK_LABELS[b] }))]}
          onChange={(v) => onQueryChange(withChanges(query, { break: v || undefined }))}
        />
        <DistanceRangeFilter
          units={units}
          minM={params.minM}
          maxM={params.maxM}
          onChange={(minM, maxM) => {
            // Widened by a hair so a 10 ft putt (3.048… m in floating point) is inside "up to 10 ft".
            const lo = minM === undefined ? undefined : Math.max(0, Math.floor(minM * 1e4 - 1e-6) / 1e4);
            const hi = maxM === undefined ? undefined : Math.min(60, Math.ceil(maxM * 1e4 + 1e-6) / 1e4);
            if (lo === params.minM && hi === params.maxM) return;
            onQueryChange(withChanges(query, { minM: lo, maxM: hi }));
          }}
        />
      </FilterBar>
      {putts.isError ? (
        <Alert tone="error" title="Could not load your putts">
          {errorMessage(putts.error)}
        </Alert>
      ) : null}
      <DataTable
        table={table}
        caption="Logged putts"
        fetching={putts.isFetching}
        total={total}
        noun={["putt", "putts"]}
        empty={active > 0 ? "No putt matches these filters." : "No putts yet. Start a session and log a few."}
      />
      <ConfirmDialog
        open={confirm !== null}
        title="Delete this putt?"
        confirmLabel="Delete putt"
        busy={remove.isPending}
        onCancel={() => setConfirm(null)}
        onConfirm={() => confirm && remove.mutate(confirm, { onSettled: () => setConfirm(null) })}
      >
        {confirm
          ? `${formatLength(confirm.distanceM, units)}, ${confirm.holed ? "holed" : "missed"}, on ${formatDate(confirm.date)}.`
          : null}
      </ConfirmDialog>
    </div>
  );
}
