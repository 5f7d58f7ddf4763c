import { formatDate } from "#shared/format";
import { useMemo, useState } from "react";
import { toast } from "../../../lib/toast";
import {
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { Alert, Button, Card, CardTitle, InputField, SelectField, TextLink } from "../../../components/ui";
import { SortableTable } from "../../../components/ui/sortable-table";
import { paths } from "../../../config/paths";
import { errorMessage } from "../../../lib/query-client";
import { downloadSquadOverview, useSquadOverview } from "../api/get-squad-overview";
import { useUnits } from "../../auth/hooks/use-units";
import { bandLabel } from "../utils/bands";
import { COMPARE_MIN_PUTTS, overviewRows, sgTrendWord, type OverviewBand, type OverviewRow } from "../utils/overview-rows";

const PERIODS = [
  { value: "14", label: "Last 2 weeks" },
  { value: "28", label: "Last 4 weeks" },
  { value: "56", label: "Last 8 weeks" },
];
const pct = (v: number | null) => (v === null ? "–" : `${Math.round(v * 100)} %`);
const sg = (v: number | null) => (v === null ? "–" : `${v > 0.0005 ? "+" : v < -0.0005 ? "−" : ""}${Math.abs(v).toFixed(3)}`);

function BandCell({ b }: { b: OverviewBand }) {
  if (b.recentN === 0 && b.pastN === 0) return <span className="text-ink-400">–</span>;
  const arrow = b.change === null ? null : b.change > 0.05 ? "▲" : b.change < -0.05 ? "▼" : "=";
  return (
    <span className="inline-flex flex-col items-end leading-tight">
      <span className="font-semibold tabular-nums">
        {pct(b.recent)}{" "}
        {arrow ? (
          <span aria-hidden="true" className={arrow === "▲" ? "text-ok-600" : arrow === "▼" ? "text-bad-600" : "text-ink-400"}>
            {arrow}
          </span>
        ) : null}
      </span>
      <span className="text-xs text-ink-500 tabular-nums">
        was {pct(b.past)}
        <span className="sr-only">
          {b.change === null
            ? `, too few putts to compare (under ${COMPARE_MIN_PUTTS})`
            : b.change > 0.05
              ? ", up"
              : b.change < -0.05
                ? ", down"
                : ", about the same"}
        </span>
      </span>
    </span>
  );
}

const col = createColumnHelper<OverviewRow>();

/**
 * The squad at a glance: each player's recent volume, make rate per band against their own past, strokes
 * gained per putt now and before, and their latest ladder. Sortable by every column, filtered by name; CSV out.
 */
export function SquadOverviewSection({ squadId, squadName }: { squadId: string; squadName: string }) {
  const { units } = useUnits();
  const [days, setDays] = useState(28);
  const [filter, setFilter] = useState("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "putts", desc: true }]);
  const [downloading, setDownloading] = useState(false);
  const overview = useSquadOverview(squadId, days);
  const rows = useMemo(() => (overview.data ? overviewRows(overview.data) : []), [overview.data]);
  const bands = useMemo(() => overview.data?.bands ?? [], [overview.data]);
  const columns = useMemo(
    () =>
      [
        col.accessor("name", {
          header: "Player",
          cell: (c) => <TextLink to={paths.coachPlayer.href(c.row.original.playerId)}>{c.getValue()}</TextLink>,
        }),
        col.accessor("sessions", { header: "Sessions", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
        col.accessor("putts", { header: "Putts", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
        col.accessor((r) => r.lastSession ?? "", {
          id: "last",
          header: "Last session",
          cell: (c) => (c.getValue() ? formatDate(c.getValue(), "day") : <span className="text-ink-400">–</span>),
        }),
        ...bands.map((b, i) =>
          col.accessor((r) => r.bands[i]?.recent ?? -1, {
            id: `band${i}`,
            header: bandLabel(b.fromM, b.toM, units),
            cell: (c) => <BandCell b={c.row.original.bands[i]!} />,
          }),
        ),
        col.accessor((r) => r.sgChange ?? -99, {
          id: "sg",
          header: "Strokes gained a putt",
          cell: (c) => (
            <span className="inline-flex flex-col items-end leading-tight">
              <span className="font-semibold tabular-nums">{sg(c.row.original.sgRecent)}</span>
              <span className="text-xs text-ink-500">
                {sgTrendWord(c.row.original.sgChange)} (was {sg(c.row.original.sgPast)})
              </span>
            </span>
          ),
        }),
        col.accessor("ladderOrder", {
          id: "ladder",
          header: "Ladder",
          cell: (c) => <span className="whitespace-normal">{c.row.original.ladder}</span>,
        }),
      ] as ColumnDef<OverviewRow, unknown>[],
    [bands, units],
  );
  // TanStack Table's instance is not memoisable by the React Compiler; this component simply is not compiled.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _id, value: string) =>
      `${row.original.name} ${row.original.email}`.toLowerCase().includes(String(value).trim().toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const shown = table.getRowModel().rows;

  return (
    <Card>
      <section aria-labelledby="overview-title" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div>
            <CardTitle as="h2">
              <span id="overview-title">How the squad is putting</span>
            </CardTitle>
            <p className="mt-1 text-ink-500">
              Each player’s recent practice against their own earlier putts. ▲ / ▼: up or down by more than 5 points with{" "}
              {COMPARE_MIN_PUTTS}+ putts each side.
            </p>
          </div>
          <Button
            size="sm"
            variant="secondary"
            disabled={rows.length === 0}
            pending={downloading}
            onClick={async () => {
              setDownloading(true);
              try {
                const name = await downloadSquadOverview(squadId, days);
                toast.success(`Saved ${name}.`);
              } catch (e) {
                toast.error(errorMessage(e));
              } finally {
                setDownloading(false);
              }
            }}
          >
            {downloading ? "Preparing…" : "Download CSV"}
          </Button>
        </div>
        <div className="grid gap-3 sm:grid-cols-[1fr_14rem]">
          <InputField
            label="Find a player"
            type="search"
            value={filter}
            onChange={(e) => setFilter(e.target.value)}
            placeholder={`Name or e-mail in ${squadName}`}
          />
          <SelectField label="Recent means" value={String(days)} options={PERIODS} onChange={(e) => setDays(Number(e.target.value))} />
        </div>
        {overview.isError ? (
          <Alert tone="error" title="Could not load the overview">
            {errorMessage(overview.error)}
          </Alert>
        ) : !overview.data ? (
          <div className="h-40 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the overview" />
        ) : rows.length === 0 ? (
          <p className="text-ink-500">
            Nobody has joined {squadName} yet. Once players accept their invitations, their practice shows here.
          </p>
        ) : shown.length === 0 ? (
          <p className="text-ink-500">No player matches “{filter}”.</p>
        ) : (
          <>
            {/* Phone: a card per player. */}
            <ul className="flex flex-col gap-2 md:hidden">
              {shown.map(({ original: r }) => (
                <li key={r.playerId} className="rounded-xl bg-white px-4 py-3 ring-1 ring-ink-900/10">
                  <TextLink to={paths.coachPlayer.href(r.playerId)}>{r.name}</TextLink>
                  <p className="mt-1 text-sm text-ink-600">
                    {r.putts} putts in {r.sessions} sessions · strokes gained {sg(r.sgRecent)} a putt,{" "}
                    {sgTrendWord(r.sgChange).toLowerCase()}
                  </p>
                  <p className="mt-1 flex flex-wrap gap-x-3 text-sm text-ink-500">
                    {bands.map((b, i) => (
                      <span key={i}>
                        {bandLabel(b.fromM, b.toM, units)}: {pct(r.bands[i]!.recent)}
                      </span>
                    ))}
                  </p>
                  <p className="mt-1 text-sm text-ink-500">{r.ladder}</p>
                </li>
              ))}
            </ul>
            {/* Desk: the sortable table. */}
            <SortableTable
              table={table}
              rows={shown}
              caption={`Players of ${squadName}: recent practice against their own past. Select a column heading to sort by it.`}
              className="rounded-xl"
            />
          </>
        )}
      </section>
    </Card>
  );
}
