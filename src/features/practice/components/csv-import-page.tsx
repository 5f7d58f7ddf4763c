import { useState } from "react";
import type { CsvImportResult, CsvPreview, CsvRowError } from "#shared/schemas/putts";
import { Alert, Button, ButtonLink, Card, CardTitle, PageHeader, SelectField, TableScroller } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { rowErrorsOf, useImportCsv } from "../api/import-csv";
import { usePreviewCsv } from "../api/preview-csv";
import { useUnits } from "../../auth/hooks/use-units";
import {
  COLUMN_FIELDS,
  fieldLabel,
  initialMapping,
  toCsvMapping,
  uploadProblem,
  validRowCount,
  type MappingState,
} from "../utils/csv-mapping";
import { CsvExportButtons } from "./csv-export-buttons";
import { FilePicker } from "./csv-file-picker";

function PreviewTable({ preview }: { preview: CsvPreview }) {
  return (
    <TableScroller label="The first rows of the file">
      <table className="w-full border-collapse bg-white text-left text-sm">
        <caption className="sr-only">The first rows of the file</caption>
        <thead className="bg-ink-50 text-ink-700">
          <tr>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Row
            </th>
            {preview.headers.map((h, i) => (
              <th key={i} scope="col" className="px-3 py-2 font-semibold whitespace-nowrap">
                {h || <span className="text-ink-400">(no name)</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((r, i) => (
            <tr key={i} className="border-t border-ink-900/5">
              <td className="px-3 py-1.5 text-right text-ink-400 tabular-nums">{i + 1}</td>
              {preview.headers.map((_, j) => (
                <td key={j} className="px-3 py-1.5 whitespace-nowrap">
                  {r[j] ?? ""}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroller>
  );
}

/** The per-row error report: row number (and spreadsheet line), field, and why. */
export function RowErrorTable({ errors }: { errors: ReadonlyArray<CsvRowError> }) {
  return (
    <div className="-mx-4 max-h-96 overflow-auto sm:mx-0 sm:rounded-xl sm:ring-1 sm:ring-ink-900/10">
      <table className="w-full border-collapse bg-white text-left text-sm">
        <caption className="sr-only">Rows that could not be imported</caption>
        <thead className="sticky top-0 bg-bad-50 text-bad-800">
          <tr>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Row
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold whitespace-nowrap">
              Spreadsheet line
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Field
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Why
            </th>
          </tr>
        </thead>
        <tbody>
          {errors.map((e, i) => (
            <tr key={i} className="border-t border-ink-900/5">
              <td className="px-3 py-1.5 text-right tabular-nums">{e.row}</td>
              <td className="px-3 py-1.5 text-right text-ink-500 tabular-nums">{e.line}</td>
              <td className="px-3 py-1.5 whitespace-nowrap">{fieldLabel(e.field)}</td>
              <td className="px-3 py-1.5">{e.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function ImportSummary({ result }: { result: CsvImportResult }) {
  return (
    <Alert tone="success" title={`Imported ${result.imported} ${result.imported === 1 ? "putt" : "putts"}`}>
      {result.sessionsCreated} {result.sessionsCreated === 1 ? "session" : "sessions"} added
      {result.greensCreated > 0 ? `, ${result.greensCreated} new ${result.greensCreated === 1 ? "green" : "greens"}` : ""}
      {result.skipped > 0 ? `; ${result.skipped} ${result.skipped === 1 ? "row was" : "rows were"} left out (listed below)` : ""}.
    </Alert>
  );
}

export type MappingFormProps = {
  preview: CsvPreview;
  mapping: MappingState;
  onChange: (m: MappingState) => void;
};

/** One select per field, prefilled from the server's suggestion, plus the units of the numbers. */
export function MappingForm({ preview, mapping, onChange }: MappingFormProps) {
  const options = [{ value: "", label: "— not in the file —" }, ...preview.headers.filter(Boolean).map((h) => ({ value: h, label: h }))];
  return (
    <div className="grid grid-cols-2 gap-x-3 gap-y-4 lg:grid-cols-3">
      {COLUMN_FIELDS.map((f) => (
        <SelectField
          key={f.key}
          label={`${f.label}${f.required ? " (required)" : ""}`}
          hint={<span className="text-xs">{f.hint}</span>}
          value={mapping[f.key]}
          options={f.required ? [{ value: "", label: "— choose a column —" }, ...options.slice(1)] : options}
          onChange={(e) => onChange({ ...mapping, [f.key]: e.target.value })}
        />
      ))}
      <SelectField
        label="Distances are in"
        value={mapping.distanceUnit}
        options={[
          { value: "ft", label: "feet" },
          { value: "m", label: "metres" },
        ]}
        onChange={(e) => onChange({ ...mapping, distanceUnit: e.target.value as "ft" | "m" })}
      />
      <SelectField
        label="Miss lengths are in"
        value={mapping.missLengthUnit}
        disabled={!mapping.missLength}
        options={[
          { value: "", label: "the distance unit" },
          { value: "in", label: "inches" },
          { value: "cm", label: "centimetres" },
          { value: "ft", label: "feet" },
          { value: "m", label: "metres" },
        ]}
        onChange={(e) => onChange({ ...mapping, missLengthUnit: e.target.value as MappingState["missLengthUnit"] })}
      />
    </div>
  );
}

/** Upload, preview, map the columns, import; a refused import lists every bad row and offers the valid ones only. */
export function CsvImportPage() {
  const { units } = useUnits();
  const preview = usePreviewCsv();
  const importer = useImportCsv();
  const [file, setFile] = useState<File | null>(null);
  const [mapping, setMapping] = useState<MappingState | null>(null);

  const choose = (f: File) => {
    setFile(f);
    setMapping(null);
    importer.reset();
    preview.mutate(f, { onSuccess: (p) => setMapping(initialMapping(p, units === "imperial" ? "ft" : "m")) });
  };

  const check = mapping ? toCsvMapping(mapping) : null;
  const refused = rowErrorsOf(importer.error);
  const result = importer.data;
  const run = (skipInvalid: boolean) => {
    if (!file || !check?.ok) return;
    importer.mutate({ file, mapping: check.mapping, skipInvalid });
  };

  return (
    <div className="flex flex-col gap-6">
      <title>Import putts · Borrowline</title>
      <PageHeader
        eyebrow="Practice log"
        title="Import putts from a CSV file"
        description="Bring in putts logged elsewhere or in a spreadsheet. Rows are grouped into sessions by day and green."
        actions={
          <ButtonLink to={paths.practice.href()} variant="secondary" size="sm">
            Back to practice
          </ButtonLink>
        }
      />

      <FilePicker onFile={choose} busy={preview.isPending} />
      {preview.isError ? (
        <Alert tone="error" title="That file could not be read">
          {uploadProblem(preview.error)}
        </Alert>
      ) : null}

      {preview.data && mapping && file ? (
        <>
          <Card>
            <CardTitle>{file.name}</CardTitle>
            <p className="mt-1 mb-4 text-sm text-ink-500">
              {preview.data.rowCount} {preview.data.rowCount === 1 ? "row" : "rows"} of putts
              {preview.data.rows.length < preview.data.rowCount ? `; the first ${preview.data.rows.length} are shown` : ""}. Columns
              separated by{" "}
              {preview.data.delimiter === ","
                ? "commas"
                : preview.data.delimiter === ";"
                  ? "semicolons"
                  : preview.data.delimiter === "\t"
                    ? "tabs"
                    : `“${preview.data.delimiter}”`}
              .
            </p>
            <PreviewTable preview={preview.data} />
          </Card>

          <Card>
            <CardTitle>Which column holds what</CardTitle>
            <p className="mt-1 mb-4 text-sm text-ink-500">Filled in from the column names; check them, then import.</p>
            <MappingForm
              preview={preview.data}
              mapping={mapping}
              onChange={(m) => {
                setMapping(m);
                importer.reset();
              }}
            />
            {check && !check.ok ? (
              <Alert tone="warning" className="mt-4">
                {check.missing.length > 0 ? `Choose a column for ${check.missing.join(", ")}. ` : ""}
                {check.duplicates.length > 0 ? `Each column can hold one field only: ${check.duplicates.join(", ")} is chosen twice.` : ""}
              </Alert>
            ) : null}
            <div className="mt-5 flex flex-wrap gap-2">
              <Button
                variant="accent"
                size="lg"
                onClick={() => run(false)}
                disabled={!check?.ok}
                loading={importer.isPending && importer.variables?.skipInvalid === false}
                loadingText="Importing…"
              >
                Import {preview.data.rowCount} {preview.data.rowCount === 1 ? "row" : "rows"}
              </Button>
            </div>
          </Card>
        </>
      ) : null}

      {refused ? (
        <Card>
          <CardTitle>Nothing was imported yet</CardTitle>
          <Alert tone="error" className="mt-3">
            {new Set(refused.errors.map((e) => e.row)).size} of {preview.data?.rowCount ?? "the"} rows have problems. Fix them in the file
            and import again, or import the valid rows only.
          </Alert>
          <div className="mt-4">
            <RowErrorTable errors={refused.errors} />
          </div>
          <div className="mt-4 flex flex-wrap gap-2">
            <Button
              variant="primary"
              onClick={() => run(true)}
              loading={importer.isPending}
              loadingText="Importing…"
              disabled={validRowCount(preview.data?.rowCount ?? 0, refused.errors) === 0}
            >
              Import the {validRowCount(preview.data?.rowCount ?? 0, refused.errors)} valid rows only
            </Button>
          </div>
        </Card>
      ) : importer.isError ? (
        <Alert tone="error" title="The import failed">
          {uploadProblem(importer.error)}
        </Alert>
      ) : null}

      {result ? (
        <Card>
          <ImportSummary result={result} />
          {result.errors.length > 0 ? (
            <div className="mt-4">
              <RowErrorTable errors={result.errors} />
            </div>
          ) : null}
          <div className="mt-4 flex flex-wrap gap-2">
            <ButtonLink to={paths.practice.href("tab=sessions")} variant="primary">
              See the sessions
            </ButtonLink>
            <ButtonLink to={paths.stats.href()} variant="secondary">
              See your make rates
            </ButtonLink>
          </div>
        </Card>
      ) : null}

      <section aria-labelledby="export-heading" className="flex flex-col gap-2">
        <h2 id="export-heading" className="text-lg font-semibold tracking-tight">
          Export
        </h2>
        <p className="text-ink-500">Every putt, or every session, as a CSV file for a spreadsheet or a backup.</p>
        <CsvExportButtons />
      </section>
    </div>
  );
}
