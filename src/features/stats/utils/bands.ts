// Band edges as the player edits them (in feet or metres) and as the API takes them (metres, comma-separated).
import { MAX_BAND_EDGE_M, MAX_BAND_EDGES, DEFAULT_BAND_EDGES_M } from "#shared/stats/bands";
import { fromLongUnit, longUnitLabel, toLongUnit, type UnitSystem } from "#shared/units";

export { DEFAULT_BAND_EDGES_M };

function trim(n: number, digits: number): string {
  return String(Number(n.toFixed(digits)));
}

/** "0–3 ft", "30+ ft", "1.5–2 m", "10+ m". */
export function bandLabel(fromM: number, toM: number | null, units: UnitSystem): string {
  const u = longUnitLabel(units);
  const digits = units === "imperial" ? 1 : 2;
  const a = trim(toLongUnit(fromM, units), digits);
  if (toM === null) return `${a}+ ${u}`;
  return `${a}–${trim(toLongUnit(toM, units), digits)} ${u}`;
}

/** "3, 6, 10, 15, 20, 30": edges in the user's unit for the editor. */
export function edgesToText(edgesM: readonly number[], units: UnitSystem): string {
  return edgesM.map((e) => trim(toLongUnit(e, units), units === "imperial" ? 1 : 2)).join(", ");
}

export type EdgesParse = { ok: true; edgesM: number[] } | { ok: false; message: string };

/** Parses "3, 6, 10" (commas, spaces or semicolons between) in the user's unit into metres, with the API's rules. */
export function edgesFromText(text: string, units: UnitSystem): EdgesParse {
  const parts = text
    .split(/[\s,;]+/)
    .map((p) => p.trim())
    .filter(Boolean);
  const u = longUnitLabel(units);
  if (parts.length === 0)
    return { ok: false, message: `Enter at least one edge in ${u}, e.g. ${units === "imperial" ? "3, 6, 10" : "1, 2, 3"}` };
  const values = parts.map(Number);
  if (values.some((v) => !Number.isFinite(v))) return { ok: false, message: `Only numbers (${u}), separated by commas` };
  const inner = values[0] === 0 ? values.slice(1) : values;
  if (inner.length === 0) return { ok: false, message: "Add an edge above 0" };
  if (inner.length > MAX_BAND_EDGES) return { ok: false, message: `At most ${MAX_BAND_EDGES} edges` };
  const maxShown = toLongUnit(MAX_BAND_EDGE_M, units);
  for (let i = 0; i < inner.length; i++) {
    const v = inner[i]!;
    if (v <= 0) return { ok: false, message: "Edges must be above 0" };
    if (v > maxShown + 1e-9) return { ok: false, message: `Edges go up to ${Math.floor(maxShown)} ${u}` };
    if (i > 0 && v <= inner[i - 1]!) return { ok: false, message: "Each edge must be longer than the one before" };
  }
  return { ok: true, edgesM: inner.map((v) => fromLongUnit(v, units)) };
}

/** The API's `bands` parameter: metres to 4 decimals, or undefined for the defaults. */
export function bandsParam(edgesM: readonly number[] | null): string | undefined {
  if (!edgesM || edgesM.length === 0) return undefined;
  return edgesM.map((e) => String(Number(e.toFixed(4)))).join(",");
}

/** The `bands` URL value back into metres; null when absent or unusable (then the defaults apply). */
export function edgesFromParam(value: string | null): number[] | null {
  if (!value) return null;
  const edges = value.split(",").map(Number);
  if (
    edges.length === 0 ||
    edges.length > MAX_BAND_EDGES ||
    edges.some((e, i) => !Number.isFinite(e) || e <= 0 || e > MAX_BAND_EDGE_M || (i > 0 && e <= edges[i - 1]!))
  )
    return null;
  return edges;
}
