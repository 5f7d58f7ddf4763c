// The history tables keep their state in the URL query (a shared link or a reload shows the same rows):
// tab, sort, page and the filters. The server sorts, filters and pages; these turn the query into API params.
import type { SortingState } from "@tanstack/react-table";
import { BREAK_TYPES, PUTT_SORTS, type BreakType } from "#shared/schemas/putts";
import { SESSION_SORTS } from "#shared/schemas/sessions";
import type { PuttListParams, PuttSort } from "../api/get-putts";
import type { SessionListParams, SessionSort } from "../api/get-sessions";
import { parseDecimal } from "#shared/units";

export const SESSION_PAGE_SIZE = 20;
export const PUTT_PAGE_SIZE = 25;

export type HistoryTab = "sessions" | "putts";

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function dateParam(q: URLSearchParams, key: string): string | undefined {
  const v = q.get(key);
  return v && ISO_DATE.test(v) && !Number.isNaN(Date.parse(v)) ? v : undefined;
}

function pageParam(q: URLSearchParams): number {
  const n = parseDecimal(q.get("page"));
  return n !== null && Number.isInteger(n) && n >= 1 && n <= 100_000 ? n : 1;
}

function numberParam(q: URLSearchParams, key: string, max: number): number | undefined {
  const n = parseDecimal(q.get(key));
  return n !== null && n >= 0 && n <= max ? n : undefined;
}

function dateRange(q: URLSearchParams): { from?: string; to?: string } {
  const from = dateParam(q, "from");
  const to = dateParam(q, "to");
  // A range the wrong way round would be a 400; drop the end instead.
  if (from && to && from > to) return { from };
  return { ...(from ? { from } : {}), ...(to ? { to } : {}) };
}

export function historyTab(q: URLSearchParams): HistoryTab {
  return q.get("tab") === "putts" ? "putts" : "sessions";
}

export function sessionParams(q: URLSearchParams): SessionListParams {
  const sort = q.get("sort");
  const greenId = q.get("green");
  return {
    page: pageParam(q),
    pageSize: SESSION_PAGE_SIZE,
    sort: (SESSION_SORTS as readonly string[]).includes(sort ?? "") ? (sort as SessionSort) : "-date",
    ...dateRange(q),
    ...(greenId && /^[0-9a-f-]{36}$/i.test(greenId) ? { greenId } : {}),
  };
}

export function puttParams(q: URLSearchParams): PuttListParams {
  const sort = q.get("sort");
  const holed = q.get("holed");
  const breakType = q.get("break");
  let minM = numberParam(q, "minM", 60);
  let maxM = numberParam(q, "maxM", 60);
  if (minM !== undefined && maxM !== undefined && minM > maxM) [minM, maxM] = [maxM, minM];
  return {
    page: pageParam(q),
    pageSize: PUTT_PAGE_SIZE,
    sort: (PUTT_SORTS as readonly string[]).includes(sort ?? "") ? (sort as PuttSort) : "-date",
    ...dateRange(q),
    ...(holed === "true" || holed === "false" ? { holed } : {}),
    ...((BREAK_TYPES as readonly string[]).includes(breakType ?? "") ? { breakType: breakType as BreakType } : {}),
    ...(minM !== undefined ? { minM } : {}),
    ...(maxM !== undefined ? { maxM } : {}),
  };
}

/**
 * A new query with `changes` applied (undefined or "" removes a key). Any change other than the page itself sends
 * the table back to page 1, since the old page may no longer exist.
 */
export function withChanges(q: URLSearchParams, changes: Record<string, string | number | undefined>): URLSearchParams {
  const next = new URLSearchParams(q);
  for (const [key, value] of Object.entries(changes)) {
    if (value === undefined || value === "") next.delete(key);
    else next.set(key, String(value));
  }
  if (!("page" in changes)) next.delete("page");
  return next;
}

/** Switching tab keeps the date range (both tables have it) and drops the rest. */
export function switchTab(q: URLSearchParams, tab: HistoryTab): URLSearchParams {
  const next = new URLSearchParams();
  if (tab === "putts") next.set("tab", "putts");
  for (const key of ["from", "to"]) {
    const v = q.get(key);
    if (v) next.set(key, v);
  }
  return next;
}

/** The API's sort string ("-date") as TanStack Table's sorting state, and back. Column ids are the API's sort keys. */
export function toSorting(sort: string): SortingState {
  return [{ id: sort.replace(/^-/, ""), desc: sort.startsWith("-") }];
}
export function fromSorting(state: SortingState, fallback: string): string {
  const first = state[0];
  if (!first) return fallback;
  return `${first.desc ? "-" : ""}${first.id}`;
}

export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}
