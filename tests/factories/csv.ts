/** A multipart CSV import of `rows` putts (dates spread over 2025, 1–9.9 m, one in three holed), with its column mapping. */
export function puttsCsvForm(rows: number): FormData {
  const lines = ["Date,Distance (m),Made"];
  for (let i = 0; i < rows; i++)
    lines.push(
      `2025-${String(1 + (i % 12)).padStart(2, "0")}-${String(1 + (i % 28)).padStart(2, "0")},${1 + (i % 90) / 10},${i % 3 === 0 ? 1 : 0}`,
    );
  const f = new FormData();
  f.append("file", new Blob([lines.join("\n")], { type: "text/csv" }), "big.csv");
  f.append("mapping", JSON.stringify({ date: "Date", distance: "Distance (m)", distanceUnit: "m", holed: "Made" }));
  return f;
}
