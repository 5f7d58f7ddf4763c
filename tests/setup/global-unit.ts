// Once per test run: a PGlite database with every migration applied, dumped to a file. Each API test
// file then loads it (≈0.7 s) instead of creating and migrating a new database (≈4 s).
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { openPglite } from "../../server/db/client";
import { analyzeStale } from "../../server/db/maintenance";
import { migrate, migrationsFolder } from "../../server/db/migrate";

declare module "vitest" {
  export interface ProvidedContext {
    pgliteTemplate: string;
  }
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
}
