// Once per test run: a PGlite database with every migration applied, dumped to a file. Each API test
// file then loads it (≈0.7 s) instead of creating and migrating a new database (≈4 s).
// And the bundle the tests' child processes start from (dist-test/: the child server, the backup CLI and the
// database builder they spawn), so a child does not compile the server with tsx on every start.
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { build } from "esbuild";
import type { TestProject } from "vitest/node";
import { openPglite } from "../../server/db/client";
import { analyzeStale } from "../../server/db/maintenance";
import { migrate, migrationsFolder } from "../../server/db/migrate";

declare module "vitest" {
  export interface ProvidedContext {
    pgliteTemplate: string;
    childBundleDir: string;
  }
}

/**
 * Bundled as production's build:server does (dependencies stay in node_modules). It sits one folder below the
 * project, as dist-server/ does, so the bundled code finds drizzle/ the same way. Two runs at once (CI's PGlite and
 * PostgreSQL passes) write the same files: each is written aside and renamed over, so neither sees half a file.
 */
async function buildChildBundle(): Promise<string> {
  const root = fileURLToPath(new URL("../..", import.meta.url));
  const outdir = path.join(root, "dist-test");
  const result = await build({
    entryPoints: ["tests/setup/child-server.ts", "server/cli/backup.ts", "server/db/pglite-create.ts"].map((f) => path.join(root, f)),
    bundle: true,
    platform: "node",
    format: "esm",
    packages: "external",
    outdir,
    entryNames: "[name]",
    write: false,
    logLevel: "warning",
  });
  fs.mkdirSync(outdir, { recursive: true });
  for (const file of result.outputFiles) {
    fs.writeFileSync(`${file.path}.${process.pid}`, file.contents);
    fs.renameSync(`${file.path}.${process.pid}`, file.path);
  }
  return outdir;
}

export default async function setup(project: TestProject) {
  const folder = migrationsFolder();
  const hash = crypto.createHash("sha256").update("analysed");
  for (const f of fs.readdirSync(folder, { recursive: true }).map(String).sort()) {
    const full = path.join(folder, f);
    if (fs.statSync(full).isFile()) hash.update(f).update(fs.readFileSync(full));
  }
  const file = path.join(os.tmpdir(), `borrowline-pglite-template-${hash.digest("hex").slice(0, 16)}.tar`);
  if (!fs.existsSync(file)) {
    const database = await openPglite("memory://");
    await migrate(database);
    // As the server does after migrations, so a test server's start finds nothing stale.
    await analyzeStale(database.db);
    const dump = await database.pglite!.dumpDataDir("none");
    fs.writeFileSync(`${file}.${process.pid}`, Buffer.from(await dump.arrayBuffer()));
    fs.renameSync(`${file}.${process.pid}`, file);
    await database.close();
  }
  project.provide("pgliteTemplate", file);
  project.provide("childBundleDir", await buildChildBundle());
}
