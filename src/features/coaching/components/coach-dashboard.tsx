import { formatDate } from "#shared/format";
import { useMemo, useState } from "react";
import { useSearchParams } from "react-router";
import clsx from "clsx";
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { ButtonLink, EmptyState, InputField, PageHeader, SelectField, TextLink } from "../../../components/ui";
import { SortableTable } from "../../../components/ui/sortable-table";
import { paths } from "../../../config/paths";
import { useCoachedPlayers } from "../api/get-coached-players";
import { useCoachSquads } from "../api/get-squads";
import { dashboardRows, filterRows, type DashboardRow } from "../utils/dashboard-rows";
import { STATUS_WORDS } from "../utils/rule-words";
import { QueryState } from "./query-state";
import { SquadChartSection } from "./squad-chart-section";
import { Badge, type BadgeTone } from "./status-badge";

type StatusValue = DashboardRow["status"];
const STATUS_LABEL: Record<StatusValue, string> = { ...STATUS_WORDS, "no-ladder": "No ladder yet" };
const STATUS_TONE: Record<StatusValue, BadgeTone> = {
  "not-started": "neutral",
  "in-progress": "warn",
  completed: "ok",
  overdue: "bad",
  "no-ladder": "neutral",
};
// Sorting by status puts what needs attention first.
const STATUS_ORDER: Record<StatusValue, number> = { overdue: 0, "not-started": 1, "in-progress": 2, completed: 3, "no-ladder": 4 };

function RungBar({ row }: { row: DashboardRow }) {
  if (!row.ladderName) return <span className="text-ink-400">—</span>;
  const pct = row.rungsTotal ? (row.status === "completed" ? 100 : ((row.rungReached - 1) / row.rungsTotal) * 100) : 0;
  return (
    <span className="flex items-center gap-2">
      <span className="tabular-nums">
        {row.rungReached} / {row.rungsTotal}
      </span>
      <span aria-hidden="true" className="h-1.5 w-14 overflow-hidden rounded-full bg-ink-900/10">
        <span
          className={clsx("block h-full rounded-full", row.status === "completed" ? "bg-ok-600" : "bg-coral-500")}
          style={{ width: `${pct}%` }}
        />
      </span>
    </span>
  );
}

const col = createColumnHelper<DashboardRow>();
const columns = [
  col.accessor("playerName", {
    header: "Player",
    cell: (c) => <TextLink to={paths.coachPlayer.href(c.row.original.playerId)}>{c.getValue()}</TextLink>,
  }),
  col.accessor("squadNames", { header: "Squad" }),
  col.accessor((r) => r.ladderName ?? "", {
    id: "ladder",
    header: "Ladder",
    cell: (c) => c.getValue() || <span className="text-ink-400">—</span>,
  }),
  col.accessor((r) => (r.rungsTotal ? (r.status === "completed" ? 1 : (r.rungReached - 1) / r.rungsTotal) : -1), {
    id: "rung",
    header: "Rung reached",
    cell: (c) => <RungBar row={c.row.original} />,
  }),
  col.accessor("attempts", {
    header: "Rung attempts",
    cell: (c) => <span className="tabular-nums">{c.row.original.ladderName ? c.getValue() : "—"}</span>,
  }),
  col.accessor((r) => r.lastActivityAt ?? "", {
    id: "last",
    header: "Last putt",
    cell: (c) => (c.getValue() ? formatDate(c.getValue(), "day") : <span className="text-ink-400">—</span>),
  }),
  col.accessor((r) => r.dueDate ?? "9999-12-31", {
    id: "due",
    header: "Due",
    cell: (c) => (c.row.original.dueDate ? formatDate(c.row.original.dueDate, "day") : <span className="text-ink-400">—</span>),
  }),
  col.accessor((r) => STATUS_ORDER[r.status], {
    id: "status",
    header: "Status",
    cell: (c) => <Badge tone={STATUS_TONE[c.row.original.status]}>{STATUS_LABEL[c.row.original.status]}</Badge>,
  }),
];

const SORT_OPTIONS = [
  { value: "status", label: "Needs attention first" },
  { value: "playerName", label: "Player" },
  { value: "due", label: "Due date" },
  { value: "last-desc", label: "Latest putt" },
  { value: "rung-desc", label: "Furthest up" },
];

function sortFromOption(v: string): SortingState {
  const desc = v.endsWith("-desc");
  return [{ id: desc ? v.slice(0, -5) : v, desc }];
}

function DashboardTable({ rows, emptyBecauseFiltered }: { rows: DashboardRow[]; emptyBecauseFiltered: boolean }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "status", desc: false }]);
  // TanStack Table's instance is not memoisable by the React Compiler; this component simply is not compiled.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const sorted = table.getRowModel().rows;
  if (rows.length === 0) {
    return emptyBecauseFiltered ? <p className="py-6 text-ink-500">No rows match these filters.</p> : null;
  }
  const sortValue = sorting[0] ? `${sorting[0].id}${sorting[0].desc ? "-desc" : ""}` : "status";
  return (
    <>
      {/* Phone: one card per row, with a sort choice instead of column headers. */}
      <div className="md:hidden">
        <SelectField
          label="Sort by"
          value={SORT_OPTIONS.some((o) => o.value === sortValue) ? sortValue : "status"}
          onChange={(e) => setSorting(sortFromOption(e.target.value))}
          options={SORT_OPTIONS}
          containerClassName="mb-3"
        />
        <ul className="flex flex-col gap-2">
          {sorted.map(({ original: r }) => (
            <li key={r.id} className="rounded-xl bg-white px-4 py-3 ring-1 ring-ink-900/10">
              <div className="flex items-start justify-between gap-2">
                <TextLink to={paths.coachPlayer.href(r.playerId)}>{r.playerName}</TextLink>
                <Badge tone={STATUS_TONE[r.status]}>{STATUS_LABEL[r.status]}</Badge>
              </div>
              <p className="mt-1 text-sm text-ink-600">{r.ladderName ?? "No ladder yet"}</p>
              {r.ladderName ? (
                <p className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-500">
                  <span>
                    Rung {r.rungReached} / {r.rungsTotal}
                  </span>
                  <span>{r.attempts} attempts</span>
                  {r.dueDate ? <span>Due {formatDate(r.dueDate, "day")}</span> : null}
                  {r.lastActivityAt ? <span>Last putt {formatDate(r.lastActivityAt, "day")}</span> : null}
                </p>
              ) : null}
            </li>
          ))}
        </ul>
      </div>
      {/* Desk: the sortable table. */}
      <SortableTable
        table={table}
        rows={sorted}
        caption="Players and their ladders. Select a column heading to sort by it."
        className="rounded-(--radius-card)"
      />
    </>
  );
}

/** Where each player of the coach's squads stands on each ladder given, and how the squad putts by distance. */
export function CoachDashboard() {
  const players = useCoachedPlayers();
  const squads = useCoachSquads();
  const [params, setParams] = useSearchParams();
  const filter = { squadId: params.get("squad") ?? "", status: params.get("status") ?? "", text: params.get("q") ?? "" };
  const setFilter = (key: "squad" | "status" | "q", value: string) =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (value) next.set(key, value);
        else next.delete(key);
        return next;
      },
      { replace: true },
    );

  const allRows = useMemo(() => dashboardRows(players.data?.players ?? []), [players.data]);
  const { squadId, status, text } = filter;
  const rows = useMemo(() => filterRows(allRows, { squadId, status, text }), [allRows, squadId, status, text]);
  const counts = {
    players: new Set(allRows.map((r) => r.playerId)).size,
    overdue: allRows.filter((r) => r.status === "overdue").length,
    completed: allRows.filter((r) => r.status === "completed").length,
  };
  const squadList = squads.data?.squads ?? [];

  return (
    <>
      <PageHeader
        eyebrow="Coaching"
        title="Coach dashboard"
        description="Every player in your squads and the ladders you gave them."
        actions={<ButtonLink to={paths.ladders.href()}>Give a ladder</ButtonLink>}
      />
      <QueryState query={players} label="Loading your players">
        {() =>
          allRows.length === 0 ? (
            <EmptyState title="No players yet" action={<ButtonLink to={paths.squads.href()}>Go to squads</ButtonLink>}>
              Invite players to a squad. Once they join, their ladders and progress show here.
            </EmptyState>
          ) : (
            <div className="flex flex-col gap-8">
              <section aria-labelledby="progress-title" className="flex flex-col gap-4">
                <h2 id="progress-title" className="sr-only">
                  Ladder progress
                </h2>
                <p className="text-ink-600">
                  <strong>{counts.players}</strong> player{counts.players === 1 ? "" : "s"} · <strong>{counts.completed}</strong> ladder
                  {counts.completed === 1 ? "" : "s"} completed ·{" "}
                  <strong className={counts.overdue ? "text-bad-600" : undefined}>{counts.overdue}</strong> overdue
                </p>
                <div className="grid gap-3 sm:grid-cols-3" role="search" aria-label="Filter the players">
                  <SelectField
                    label="Squad"
                    value={filter.squadId}
                    onChange={(e) => setFilter("squad", e.target.value)}
                    options={[{ value: "", label: "All squads" }, ...squadList.map((s) => ({ value: s.id, label: s.name }))]}
                  />
                  <SelectField
                    label="Status"
                    value={filter.status}
                    onChange={(e) => setFilter("status", e.target.value)}
                    options={[
                      { value: "", label: "Any status" },
                      ...(Object.keys(STATUS_LABEL) as StatusValue[]).map((k) => ({ value: k, label: STATUS_LABEL[k] })),
                    ]}
                  />
                  <InputField
                    label="Search"
                    type="search"
                    placeholder="Player or ladder"
                    value={filter.text}
                    onChange={(e) => setFilter("q", e.target.value)}
                  />
                </div>
                <DashboardTable rows={rows} emptyBecauseFiltered={allRows.length > 0} />
              </section>
              <SquadChartSection squads={squadList} squadId={filter.squadId || undefined} />
            </div>
          )
        }
      </QueryState>
    </>
  );
}
