import { useSearchParams } from "react-router";
import clsx from "clsx";
import { historyTab, switchTab, type HistoryTab } from "../utils/table-query";
import { useUnits } from "../../auth/hooks/use-units";
import { PuttsTable } from "./putts-table";
import { SessionsTable } from "./sessions-table";

const TABS: { id: HistoryTab; label: string }[] = [
  { id: "sessions", label: "Sessions" },
  { id: "putts", label: "Putts" },
];

/** The practice history: sessions or single putts; tab, sort, page and filters sit in the URL query. */
export function HistorySection() {
  const [query, setQuery] = useSearchParams();
  const { units } = useUnits();
  const tab = historyTab(query);
  const change = (next: URLSearchParams) => setQuery(next, { preventScrollReset: true });
  return (
    <section aria-labelledby="history-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="history-heading" className="text-2xl font-semibold tracking-tight">
          History
        </h2>
        <div role="tablist" aria-label="Show" className="flex rounded-xl bg-ink-900/5 p-1">
          {TABS.map((t) => (
            <button
              key={t.id}
              type="button"
              role="tab"
              aria-selected={tab === t.id}
              onClick={() => tab !== t.id && change(switchTab(query, t.id))}
              className={clsx(
                "min-h-11 rounded-lg px-4 text-sm font-medium",
                tab === t.id ? "bg-white text-ink-900 shadow-sm" : "text-ink-600 hover:text-ink-900",
              )}
            >
              {t.label}
            </button>
          ))}
        </div>
      </div>
      <div role="tabpanel" aria-label={tab === "sessions" ? "Sessions" : "Putts"}>
        {tab === "sessions" ? (
          <SessionsTable query={query} onQueryChange={change} />
        ) : (
          <PuttsTable query={query} onQueryChange={change} units={units} />
        )}
      </div>
    </section>
  );
}
