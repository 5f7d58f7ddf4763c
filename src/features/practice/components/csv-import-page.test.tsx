// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test } from "vitest";
import { cleanup, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { http, HttpResponse, meAnswer, network, watchUploads, type JsonBodyType } from "../../../testing/network";
import { CsvImportPage } from "./csv-import-page";

const me = {
  user: { id: "u1", name: "Ivo", email: "ivo@example.test", role: "player", emailVerified: true },
  preferences: { units: "imperial" },
};
const preview = {
  headers: ["Date", "Distance (ft)", "Made", "Side", "Green"],
  rows: [
    ["2024-05-01", "10", "no", "left", "Top green"],
    ["2024-05-01", "three", "yes", "", "Top green"],
    ["May 2", "6", "maybe", "", "Top green"],
  ],
  rowCount: 3,
  delimiter: ",",
  suggestedMapping: { date: "Date", distance: "Distance (ft)", distanceUnit: "ft", holed: "Made", missSide: "Side", green: "Green" },
};
const rowErrors = [
  { row: 2, line: 3, field: "distance", message: '"three" is not a number' },
  { row: 3, line: 4, field: "date", message: '"May 2" is not a date as YYYY-MM-DD' },
  { row: 3, line: 4, field: "holed", message: '"maybe" is not yes/no, true/false, 1/0 or holed/missed' },
];

type Answer = { status: number; body: unknown };
const reply = (a: Answer) => HttpResponse.json(a.body as JsonBodyType, { status: a.status });

/** The API for this page; returns each upload's text fields (a file as `file:<name>`), in the order sent. */
function stubApi(answers: { preview?: Answer; imports?: Answer[] }) {
  let imports = 0;
  network.use(
    meAnswer(me),
    http.post("/api/csv/putts/preview", () => reply(answers.preview ?? { status: 200, body: preview })),
    http.post("/api/csv/putts/import", () => reply(answers.imports![imports++]!)),
  );
  const uploads = watchUploads();
  return {
    get calls() {
      return uploads.map(({ path, form }) => {
        const fields: Record<string, string> = {};
        for (const [k, v] of form.entries()) fields[k] = typeof v === "string" ? v : `file:${v.name}`;
        return { url: path, fields };
      });
    },
  };
}

afterEach(() => {
  cleanup();
});

const file = () => new File(["Date,Distance (ft),Made\n"], "putts.csv", { type: "text/csv" });

test("the mapping is prefilled from the suggestion, and a refused import lists each bad row with its field and why", async () => {
  const api = stubApi({
    imports: [
      {
        status: 422,
        body: {
          error: { code: "unprocessable", message: "2 row(s) have errors; nothing was imported.", fields: { file: "2 invalid row(s)" } },
          imported: 0,
          sessionsCreated: 0,
          greensCreated: 0,
          skipped: 2,
          errors: rowErrors,
        },
      },
      { status: 200, body: { imported: 1, sessionsCreated: 1, greensCreated: 1, skipped: 2, errors: rowErrors } },
    ],
  });
  const user = userEvent.setup();
  renderRoute(<CsvImportPage />, { at: "/practice/import" });
  await user.upload(screen.getByLabelText("CSV file"), file());

  expect(await screen.findByRole("heading", { name: "putts.csv" })).toBeInTheDocument();
  expect(screen.getByRole("table", { name: "The first rows of the file" })).toHaveTextContent("three");
  expect(screen.getByLabelText("Day (required)")).toHaveValue("Date");
  expect(screen.getByLabelText("Distance (required)")).toHaveValue("Distance (ft)");
  expect(screen.getByLabelText("Holed (required)")).toHaveValue("Made");
  expect(screen.getByLabelText("Miss side")).toHaveValue("Side");
  expect(screen.getByLabelText("Break")).toHaveValue("");
  expect(screen.getByLabelText("Distances are in")).toHaveValue("ft");

  await user.click(screen.getByRole("button", { name: "Import 3 rows" }));

  const report = await screen.findByRole("table", { name: "Rows that could not be imported" });
  const rows = within(report).getAllByRole("row").slice(1);
  expect(
    rows.map((r) =>
      within(r)
        .getAllByRole("cell")
        .map((c) => c.textContent),
    ),
  ).toEqual([
    ["2", "3", "Distance", '"three" is not a number'],
    ["3", "4", "Day", '"May 2" is not a date as YYYY-MM-DD'],
    ["3", "4", "Holed", '"maybe" is not yes/no, true/false, 1/0 or holed/missed'],
  ]);
  expect(screen.getByText(/2 of 3 rows have problems/)).toBeInTheDocument();
  expect(api.calls.find((c) => c.url === "/api/csv/putts/import")?.fields).toMatchObject({ skipInvalid: "false", file: "file:putts.csv" });
  expect(JSON.parse(api.calls.find((c) => c.url === "/api/csv/putts/import")!.fields.mapping!)).toEqual({
    date: "Date",
    distance: "Distance (ft)",
    distanceUnit: "ft",
    holed: "Made",
    missSide: "Side",
    green: "Green",
  });

  await user.click(screen.getByRole("button", { name: "Import the 1 valid rows only" }));
  expect(await screen.findByText("Imported 1 putt")).toBeInTheDocument();
  expect(api.calls.filter((c) => c.url === "/api/csv/putts/import").map((c) => c.fields.skipInvalid)).toEqual(["false", "true"]);
});

test("a required column left unmapped stops the import before anything is sent", async () => {
  const api = stubApi({});
  const user = userEvent.setup();
  renderRoute(<CsvImportPage />, { at: "/practice/import" });
  await user.upload(screen.getByLabelText("CSV file"), file());
  await user.selectOptions(await screen.findByLabelText("Holed (required)"), "");
  expect(screen.getByText(/Choose a column for Holed/)).toBeInTheDocument();
  expect(screen.getByRole("button", { name: "Import 3 rows" })).toBeDisabled();
  expect(api.calls.some((c) => c.url === "/api/csv/putts/import")).toBe(false);
});

test("too large and not-CSV uploads are explained in plain words", async () => {
  stubApi({
    preview: {
      status: 413,
      body: { error: { code: "payload_too_large", message: "The file is larger than 1 MB.", fields: { file: "at most 1 MB" } } },
    },
  });
  const user = userEvent.setup();
  renderRoute(<CsvImportPage />, { at: "/practice/import" });
  await user.upload(screen.getByLabelText("CSV file"), file());
  expect(await screen.findByRole("alert")).toHaveTextContent("That file is too large: the limit is 1 MB.");
  cleanup();

  stubApi({ preview: { status: 415, body: { error: { code: "unsupported_media_type", message: "Upload a CSV file (got image/png)." } } } });
  renderRoute(<CsvImportPage />, { at: "/practice/import" });
  // The picker offers CSV files only, but a dropped file (or "All files" in the picker) can be anything.
  await userEvent
    .setup({ applyAccept: false })
    .upload(screen.getByLabelText("CSV file"), new File(["x"], "photo.png", { type: "image/png" }));
  expect(await screen.findByRole("alert")).toHaveTextContent("That file is not a CSV.");
});
