// CSV in and out: uploads through multer (memory, size-limited), parsing and writing with papaparse.
import type { RequestHandler } from "express";
import multer from "multer";
import Papa from "papaparse";
import { ERROR_CODES } from "../../shared/errors";
import { badRequest, HttpError } from "./http-error";

export const CSV_MAX_BYTES = 1024 * 1024;

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: CSV_MAX_BYTES, files: 1, fields: 5, fieldSize: 64 * 1024, parts: 8 },
}).single("file");

const unsupported = (message: string) => new HttpError(415, ERROR_CODES.unsupportedMedia, message, { file: message });

/** Parses a multipart upload with one file in the field `file`; limits and malformed bodies map to our errors. */
export const csvUpload: RequestHandler = (req, res, next) => {
  if (!req.is("multipart/form-data")) {
    next(unsupported("Upload the file as multipart/form-data in the field file."));
    return;
  }
  upload(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === "LIMIT_FILE_SIZE") {
        return next(
          new HttpError(413, ERROR_CODES.tooLarge, `The file is larger than ${CSV_MAX_BYTES / 1024 / 1024} MB.`, { file: "at most 1 MB" }),
        );
      }
      if (err.code === "LIMIT_UNEXPECTED_FILE")
        return next(badRequest("Send one file, in the field file.", { [err.field ?? "file"]: "unexpected file field" }));
      return next(badRequest("The upload could not be read.", { [err.field ?? "file"]: err.message }));
    }
    next(badRequest("The upload could not be read.", { file: "malformed multipart body" }));
  });
};

const CSV_TYPES = new Set(["text/csv", "application/csv", "text/comma-separated-values", "text/plain", "application/vnd.ms-excel"]);

/** The uploaded file as text: a CSV (by type or name) in UTF-8; anything else is a 415. */
export function csvText(file: Express.Multer.File | undefined): string {
  if (!file) throw badRequest("Attach a CSV file in the field file.", { file: "Attach a CSV file" });
  const typeOk = CSV_TYPES.has(file.mimetype.toLowerCase()) || /\.(csv|txt)$/i.test(file.originalname);
  if (!typeOk) throw unsupported(`Upload a CSV file (got ${file.mimetype}).`);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(file.buffer);
  } catch {
    throw unsupported("The file is not UTF-8 text; save it as CSV (UTF-8).");
  }
  if (text.includes("\u0000")) throw unsupported("The file is binary, not CSV text.");
  return text.replace(/^\uFEFF/, "");
}

export type ParsedCsv = { headers: string[]; rows: string[][]; delimiter: string; problems: { row: number; message: string }[] };

/**
 * Header row plus data records. Blank records are kept as empty arrays so record numbers stay those a
 * spreadsheet shows (data row n is spreadsheet row n + 1).
 */
export function parseCsv(text: string): ParsedCsv {
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false });
  const [header, ...rest] = parsed.data;
  const headers = (header ?? []).map((h) => h.trim());
  if (headers.length === 0 || headers.every((h) => h === "")) throw badRequest("The file has no header row.", { file: "no header row" });
  const rows = rest.map((r) => (r.every((c) => c.trim() === "") ? [] : r));
  // A trailing newline gives one last empty record: not a row anyone wrote.
  while (rows.length > 0 && rows[rows.length - 1]!.length === 0) rows.pop();
  const problems = parsed.errors.filter((e) => e.row !== undefined && e.row > 0).map((e) => ({ row: e.row!, message: e.message }));
  return { headers, rows, delimiter: parsed.meta.delimiter, problems };
}

/** A line that a spreadsheet could read as a formula: it starts with = + - @, a tab or a carriage return (OWASP, "CSV Injection"). */
const FORMULA_LINE = /^'*[=+\-@\t\r]/m;

/**
 * Neutralises formulas on every line of a text cell: each line that starts with = + - @ tab or CR gets a
 * leading ' (and a line our guard already marked gets one more, so import undoes it exactly).
 * papaparse's `escapeFormulae` (boolean or RegExp) only prefixes the start of the whole cell, so a
 * second line such as "=1+1\n=2+2" would pass; this runs before papaparse, which still does all the quoting.
 */
export function guardFormulae(cell: string): string {
  return FORMULA_LINE.test(cell) ? cell.replace(/^(?='*[=+\-@\t\r])/gm, "'") : cell;
}

/** Undoes our own export's formula guard on every line: one leading ' before ('* and) = + - @ tab or CR. */
export function unguard(cell: string): string {
  return cell.replace(/^'(?='*[=+\-@\t\r])/gm, "");
}

/**
 * Writes CSV with papaparse. Text cells have formulas neutralised on every line (guardFormulae); numbers and
 * booleans are written as they are, so -0.3 stays a number.
 */
export function toCsv(fields: string[], data: (string | number | boolean | null)[][]): string {
  const guarded = data.map((row) => row.map((cell) => (typeof cell === "string" ? guardFormulae(cell) : cell)));
  return Papa.unparse({ fields: fields.map(guardFormulae), data: guarded }, { escapeFormulae: false, newline: "\r\n" });
}
