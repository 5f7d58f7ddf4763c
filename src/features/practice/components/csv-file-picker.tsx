// The CSV import page's file picker (csv-import-page.tsx): choose or drop one CSV file.
import { useId, useRef, useState, type DragEvent } from "react";
import clsx from "clsx";
import { Button } from "../../../components/ui";

export function FilePicker({ onFile, busy }: { onFile: (f: File) => void; busy: boolean }) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const drop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    const f = e.dataTransfer.files[0];
    if (f) onFile(f);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
      data-testid="csv-drop-zone"
      className={clsx(
        "flex flex-col items-center gap-3 rounded-(--radius-card) border-2 border-dashed px-6 py-10 text-center transition-colors",
        over ? "border-coral-500 bg-coral-50" : "border-ink-900/20 bg-white/60",
      )}
    >
      <p className="text-lg font-semibold text-ink-800">Drop a CSV file here</p>
      <p className="text-ink-500">or</p>
      <label htmlFor={inputId} className="sr-only">
        CSV file
      </label>
      <input
        ref={input}
        id={inputId}
        type="file"
        accept=".csv,.txt,text/csv"
        className="sr-only"
        onChange={(e) => {
          const f = e.target.files?.[0];
          if (f) onFile(f);
          e.target.value = "";
        }}
      />
      <Button variant="primary" onClick={() => input.current?.click()} loading={busy} loadingText="Reading the file…">
        Choose a file
      </Button>
      <p className="max-w-md text-sm text-ink-500">
        One putt per row with a header row: at least the day, the distance and whether it was holed. Up to 1 MB. Borrowline’s own putts
        export imports as it is.
      </p>
    </div>
  );
}
