import { useMutation } from "@tanstack/react-query";
import type { CsvPreview } from "#shared/schemas/putts";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";

/** POST /api/csv/putts/preview (multipart, field `file`) → headers, the first rows and a suggested mapping. */
export function previewCsv(file: File): Promise<CsvPreview> {
  const form = new FormData();
  form.append("file", file, file.name);
  return api.post<CsvPreview>(apiPaths.csvPreview, form);
}

export function usePreviewCsv() {
  // The import screen explains 413/415 itself.
  return useMutation({ mutationFn: previewCsv, meta: { errorToast: false } });
}
