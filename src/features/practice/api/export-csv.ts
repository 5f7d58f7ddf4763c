import { useMutation } from "@tanstack/react-query";
import { apiPaths } from "../../../config/paths";
import { downloadFile } from "../../../lib/api-client";

export type ExportKind = "putts" | "sessions";

/** GET /api/csv/putts/export or /api/csv/sessions/export, saved by the browser as a file. Resolves with its name. */
export function exportCsv(kind: ExportKind, range: { from?: string; to?: string } = {}): Promise<string> {
  const url = kind === "putts" ? apiPaths.csvPuttsExport : apiPaths.csvSessionsExport;
  return downloadFile(url, { query: range, fallbackName: `borrowline-${kind}.csv` });
}

export function useExportCsv() {
  return useMutation({
    mutationFn: ({ kind, range }: { kind: ExportKind; range?: { from?: string; to?: string } }) => exportCsv(kind, range),
  });
}
