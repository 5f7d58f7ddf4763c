// The server's answer to a refused height map, sorted for the form: errors of a field beside it, the rest (rows and
// columns of the file) as a list in the order the file reads.
import { isApiError } from "../../../lib/api-client";

export type UploadField = "file" | "spacingM" | "originXM" | "originYM" | "format";
const FIELD_NAMES: ReadonlySet<string> = new Set(["spacingM", "originXM", "originYM", "format"]);

export type UploadProblems = {
  title: string;
  byField: Partial<Record<UploadField, string>>;
  /** "row 3, column 5" → "is empty (a hole in the grid)", rows and columns in file order. */
  inFile: { where: string; why: string }[];
};

function place(where: string): [number, number] {
  const row = /row (\d+)/.exec(where);
  const col = /column (\d+)/.exec(where);
  return [row ? Number(row[1]) : 0, col ? Number(col[1]) : 0];
}

export function uploadProblems(error: unknown): UploadProblems | null {
  if (!error) return null;
  if (!isApiError(error)) return { title: error instanceof Error ? error.message : "The upload failed.", byField: {}, inFile: [] };
  const byField: UploadProblems["byField"] = {};
  const inFile: UploadProblems["inFile"] = [];
  for (const [where, why] of Object.entries(error.fields)) {
    if (FIELD_NAMES.has(where)) byField[where as UploadField] = why;
    else inFile.push({ where: where === "file" ? "The file" : where, why });
  }
  inFile.sort((a, b) => {
    const [ra, ca] = place(a.where);
    const [rb, cb] = place(b.where);
    return ra - rb || ca - cb;
  });
  return { title: error.message, byField, inFile };
}

/** "row 3, column 5" → "Row 3, column 5"; "heightsM" → "The grid"; "points" → "The spot heights". */
export function whereWords(where: string): string {
  if (where === "heightsM") return "The grid";
  if (where === "points") return "The spot heights";
  return where.charAt(0).toUpperCase() + where.slice(1);
}
