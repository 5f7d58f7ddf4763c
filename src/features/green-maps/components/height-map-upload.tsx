// Upload a height map: a CSV grid (rows north to south, with its spacing and south-west corner) or spot heights
// (x,y,z rows), sent as multipart to PUT /api/greens/:id/height-map. The server's row and column errors are listed.
import { parseDecimal } from "#shared/units";
import { useId, useState, type FormEvent } from "react";
import { Alert, Button, ChoiceGroup, InputField } from "../../../components/ui";
import { useUploadHeightMap } from "../api/upload-height-map";
import { uploadProblems, whereWords } from "../utils/upload-errors";

function parse(text: string): number {
  return parseDecimal(text) ?? Number.NaN;
}

export function HeightMapUpload({ greenId, replacing, onUploaded }: { greenId: string; replacing: boolean; onUploaded?: () => void }) {
  const upload = useUploadHeightMap(greenId);
  const fileId = useId();
  const [format, setFormat] = useState<"grid" | "spots">("grid");
  const [file, setFile] = useState<File | null>(null);
  const [spacing, setSpacing] = useState("0.5");
  const [originX, setOriginX] = useState("0");
  const [originY, setOriginY] = useState("0");
  const [local, setLocal] = useState<Record<string, string>>({});
  const problems = uploadProblems(upload.error);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const errors: Record<string, string> = {};
    const spacingM = parse(spacing);
    const originXM = parse(originX);
    const originYM = parse(originY);
    if (!file) errors.file = "Choose a CSV file to upload.";
    if (!(spacingM > 0)) errors.spacingM = "Enter the spacing in metres, e.g. 0.5.";
    if (format === "grid" && !Number.isFinite(originXM)) errors.originXM = "Enter a number of metres (0 if unsure).";
    if (format === "grid" && !Number.isFinite(originYM)) errors.originYM = "Enter a number of metres (0 if unsure).";
    setLocal(errors);
    if (Object.keys(errors).length > 0 || !file) return;
    upload.mutate(
      { file, format, spacingM, originXM, originYM },
      {
        onSuccess: () => {
          setFile(null);
          onUploaded?.();
        },
      },
    );
  };

  const fieldError = (name: "spacingM" | "originXM" | "originYM" | "file") => local[name] ?? problems?.byField[name];

  return (
    <form aria-label="Upload a height map" className="flex flex-col gap-4" onSubmit={submit} noValidate>
      <h2 className="text-lg font-semibold tracking-tight">{replacing ? "Replace the height map" : "Upload a height map"}</h2>
      <ChoiceGroup
        legend="What the file holds"
        inputProps={{ name: "format" }}
        value={format}
        onValueChange={(v) => setFormat(v as "grid" | "spots")}
        choices={[
          { value: "grid", label: "A grid of heights", description: "One line per row, north to south; heights in metres, west to east." },
          { value: "spots", label: "Spot heights", description: "One x,y,z line per point, in metres; put points at the corners." },
        ]}
      />
      <div className="flex flex-col gap-1.5">
        <label htmlFor={fileId} className="text-sm font-medium text-ink-800">
          CSV file
        </label>
        <input
          id={fileId}
          type="file"
          accept=".csv,.txt,text/csv,text/plain"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          aria-invalid={fieldError("file") ? true : undefined}
          className="block w-full text-sm text-ink-800 file:mr-3 file:min-h-11 file:rounded-xl file:border-2 file:border-ink-900/15 file:bg-sand-50 file:px-3 file:font-medium file:text-ink-900 hover:file:border-ink-900/30"
        />
        {fieldError("file") ? <p className="text-sm font-medium text-bad-600">{fieldError("file")}</p> : null}
      </div>
      <div className="grid gap-4 sm:grid-cols-3">
        <InputField
          label={format === "grid" ? "Spacing (m)" : "Grid spacing (m)"}
          hint={format === "grid" ? "Between neighbouring heights" : "Of the grid the points fill"}
          inputMode="decimal"
          value={spacing}
          onChange={(e) => setSpacing(e.target.value)}
          error={fieldError("spacingM")}
        />
        {format === "grid" ? (
          <>
            <InputField
              label="South-west corner, east (m)"
              inputMode="decimal"
              value={originX}
              onChange={(e) => setOriginX(e.target.value)}
              error={fieldError("originXM")}
            />
            <InputField
              label="South-west corner, north (m)"
              inputMode="decimal"
              value={originY}
              onChange={(e) => setOriginY(e.target.value)}
              error={fieldError("originYM")}
            />
          </>
        ) : null}
      </div>
      {problems ? (
        <Alert tone="error" title={problems.title}>
          {problems.inFile.length > 0 ? (
            <>
              <p>Fix these in the file and upload it again:</p>
              <ul className="mt-1 list-disc pl-5" aria-label="Problems in the file">
                {problems.inFile.map((p) => (
                  <li key={p.where}>
                    <span className="font-semibold">{whereWords(p.where)}</span> {p.why}
                  </li>
                ))}
              </ul>
            </>
          ) : null}
        </Alert>
      ) : null}
      <div>
        <Button type="submit" loading={upload.isPending} loadingText="Uploading…">
          {replacing ? "Upload the new map" : "Upload height map"}
        </Button>
      </div>
    </form>
  );
}
