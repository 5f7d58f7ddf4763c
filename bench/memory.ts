// Server memory right after start on an empty database (RSS), with PGlite's buffer pool at our setting (32 MB) and at
// its default (128 MB), both measured in this run: the first start ever (PGlite creates the database) and a restart.
// The server is measured as it ships: bundled by esbuild with the flags of `npm run build:server` (tsx would add its
// own compiler's memory), into dist-bench/ beside the bundled pglite-create.js a first start runs.
// Run: npx tsx bench/memory.ts
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";

type Start = { rssMB: number; externalMB: number };
export type MemoryBenchResult = { sharedBuffers: string; first: Start; restart: Start }[];

function bundle(): void {
  execFileSync(
    path.join("node_modules", ".bin", "esbuild"),
    [
      "bench/memory-server.ts",
      "server/db/pglite-create.ts",
      "--bundle",
      "--platform=node",
      "--format=esm",
      "--packages=external",
      "--outdir=dist-bench",
      "--out-extension:.js=.js",
      "--entry-names=[name]",
      "--log-level=warning",
    ],
    { stdio: "inherit" },
  );
}

function startOnce(dataDir: string, sharedBuffers: string): Start {
  const out = execFileSync(process.execPath, ["dist-bench/memory-server.js"], {
    env: { PATH: process.env.PATH, HOME: process.env.HOME, DATA_DIR: dataDir, PGLITE_SHARED_BUFFERS: sharedBuffers },
    encoding: "utf8",
  });
  return JSON.parse(out.trim().split("\n").pop()!) as Start;
}

export function runMemoryBench(): MemoryBenchResult {
  bundle();
  return ["32MB", "128MB"].map((sharedBuffers) => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-memory-"));
    try {
      return { sharedBuffers, first: startOnce(dir, sharedBuffers), restart: startOnce(dir, sharedBuffers) };
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
}

export function printMemoryBench(r: MemoryBenchResult): void {
  const f = (s: Start) =>
    `${s.rssMB.toFixed(0).padStart(5)} MB RSS (${s.externalMB.toFixed(0)} MB outside the JS heap, mostly PGlite's WebAssembly memory)`;
  for (const x of r) {
    const tag = x.sharedBuffers === "32MB" ? "ours" : "PGlite's default";
    console.log(`  shared_buffers=${x.sharedBuffers} (${tag})`);
    console.log(`    first start, new database: ${f(x.first)}   goal ≤ 400 MB: ${x.first.rssMB <= 400 ? "met" : "NOT met"}`);
    console.log(`    restart, empty database:   ${f(x.restart)}   goal ≤ 400 MB: ${x.restart.rssMB <= 400 ? "met" : "NOT met"}`);
  }
  console.log(
    `  (load average ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")})`,
  );
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printMemoryBench(runMemoryBench());
}
