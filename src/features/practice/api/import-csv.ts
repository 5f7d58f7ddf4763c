import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CsvImportResult, CsvMapping, CsvRowError } from "#shared/schemas/putts";
import { apiPaths } from "../../../config/paths";
import { api, ApiError } from "../../../lib/api-client";
import { practiceKeys } from "./keys";

export type ImportCsvInput = { file: File; mapping: CsvMapping; skipInvalid: boolean };

/**
 * POST /api/csv/putts/import (file + `mapping` JSON + `skipInvalid`). All or nothing unless skipInvalid: a file with
 * bad rows answers 422 with every row error and stores nothing.
 */
export function importCsv({ file, mapping, skipInvalid }: ImportCsvInput): Promise<CsvImportResult> {
  const form = new FormData();
  form.append("file", file, file.name);
  form.append("mapping", JSON.stringify(mapping));
  form.append("skipInvalid", skipInvalid ? "true" : "false");
  return api.post<CsvImportResult>(apiPaths.csvImport, form);
}

/** The row errors a refused import carried (422), or null when the failure was something else. */
export function rowErrorsOf(error: unknown): { errors: CsvRowError[]; skipped: number } | null {
  if (!(error instanceof ApiError) || error.status !== 422) return null;
  const body = error.body as { errors?: unknown; skipped?: unknown } | undefined;
  if (!body || !Array.isArray(body.errors)) return null;
  return { errors: body.errors as CsvRowError[], skipped: typeof body.skipped === "number" ? body.skipped : 0 };
}

export function useImportCsv() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importCsv,
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: practiceKeys.all }),
  });
}
