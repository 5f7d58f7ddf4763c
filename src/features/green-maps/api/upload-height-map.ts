import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { HeightMapSummary } from "#shared/schemas/height-map";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { greenMapsKeys } from "./keys";

export type HeightMapUpload = {
  file: File;
  /** "grid": rows of heights north to south; "spots": x,y,z rows interpolated onto a grid. */
  format: "grid" | "spots";
  spacingM: number;
  /** The grid's south-west corner in the green's frame, m (grids only; spot heights carry their own positions). */
  originXM?: number;
  originYM?: number;
};

/** The multipart body PUT /api/greens/:id/height-map expects: the file in `file`, the numbers as text fields. */
export function heightMapForm(upload: HeightMapUpload): FormData {
  const form = new FormData();
  form.append("format", upload.format);
  form.append("spacingM", String(upload.spacingM));
  if (upload.format === "grid") {
    form.append("originXM", String(upload.originXM ?? 0));
    form.append("originYM", String(upload.originYM ?? 0));
  }
  form.append("file", upload.file, upload.file.name);
  return form;
}

/** PUT /api/greens/:id/height-map → the map's summary. A 400 names each bad row and column in `fields`. */
export function uploadHeightMap(greenId: string, upload: HeightMapUpload): Promise<HeightMapSummary> {
  return api.put<HeightMapSummary>(apiPaths.greenHeightMap(greenId), heightMapForm(upload));
}

export function useUploadHeightMap(greenId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (upload: HeightMapUpload) => uploadHeightMap(greenId, upload),
    // The form lists the server's row and column errors itself.
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: greenMapsKeys.green(greenId) }),
  });
}
