import { RequireAuth } from "../../features/auth/components/require-auth";
import { CsvImportPage } from "../../features/practice/components/csv-import-page";
import { PracticeNav } from "../layout/practice-nav";

export function PracticeImportRoute() {
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <CsvImportPage />
      </RequireAuth>
    </>
  );
}

export { PracticeImportRoute as Component };
