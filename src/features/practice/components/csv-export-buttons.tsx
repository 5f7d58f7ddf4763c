import { toast } from "../../../lib/toast";
import { Button } from "../../../components/ui";
import { useExportCsv, type ExportKind } from "../api/export-csv";

/** Downloads every putt or every session as CSV (the putts file imports back as it is). */
export function CsvExportButtons({ className }: { className?: string }) {
  const exportCsv = useExportCsv();
  const run = (kind: ExportKind) => exportCsv.mutate({ kind }, { onSuccess: (name) => toast.success(`Downloaded ${name}`) });
  const busy = (kind: ExportKind) => exportCsv.isPending && exportCsv.variables?.kind === kind;
  return (
    <div className={className ?? "flex flex-wrap gap-2"}>
      <Button variant="secondary" size="sm" onClick={() => run("putts")} loading={busy("putts")} loadingText="Preparing…">
        Export putts (CSV)
      </Button>
      <Button variant="secondary" size="sm" onClick={() => run("sessions")} loading={busy("sessions")} loadingText="Preparing…">
        Export sessions (CSV)
      </Button>
    </div>
  );
}
