// The data directory is private whatever the umask the server is started under: directories 0700, files
// 0600, the auth secret and backups included, and a directory left world-writable by an older version is fixed.
import { execFileSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, expect, test } from "vitest";
import { TEST_PASSWORD, uniqueEmail } from "../factories/users";
import { childServerArgv, spawnChildServer } from "../setup/children";
import { HttpClient } from "../setup/http";

const root = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-private-"));
const children: ChildProcess[] = [];
afterAll(() => {
  for (const c of children) if (c.exitCode === null) c.kill("SIGKILL");
  fs.rmSync(root, { recursive: true, force: true });
});

// A clean environment (no DATABASE_URL: this is about the embedded database's files), under umask 000.
const envFor = (dataDir: string) => ({ PATH: process.env.PATH, HOME: process.env.HOME, DATA_DIR: dataDir });
const underUmask0 = (command: string) => ["-c", `umask 000 && exec ${command}`];

/** Every entry under `dir` (and `dir`) whose permission bits are not 0700 (directories) or 0600 (files). */
function loosePermissions(dir: string): string[] {
  const loose: string[] = [];
  const walk = (at: string) => {
    const stat = fs.lstatSync(at);
    if (stat.isSymbolicLink()) return;
    const mode = stat.mode & 0o777;
    if (stat.isDirectory()) {
      if (mode !== 0o700) loose.push(`${at} ${mode.toString(8)}`);
      for (const name of fs.readdirSync(at)) walk(path.join(at, name));
    } else if (mode !== 0o600) {
      loose.push(`${at} ${mode.toString(8)}`);
    }
  };
  walk(dir);
  return loose;
}

test("started under umask 000, the server keeps DATA_DIR at 0700/0600, and npm run backup writes a 0600 file in a 0700 directory", async () => {
  const dataDir = path.join(root, "data");
  // An installation from before: a world-writable directory and file.
  fs.mkdirSync(dataDir, { mode: 0o777 });
  fs.chmodSync(dataDir, 0o777);
  fs.writeFileSync(path.join(dataDir, "old-notes.txt"), "left over", { mode: 0o666 });
  fs.chmodSync(path.join(dataDir, "old-notes.txt"), 0o666);

  const argv = [
    "sh",
    ...underUmask0(
      childServerArgv()
        .map((a) => `"${a}"`)
        .join(" "),
    ),
  ];
  const { url, child, exited } = await spawnChildServer(envFor(dataDir), children, { argv });
  const client = new HttpClient(url);
  expect(
    (
      await client.post("/api/auth/sign-up/email", {
        name: "Private",
        email: uniqueEmail("private"),
        password: TEST_PASSWORD,
        accountType: "player",
      })
    ).status,
  ).toBe(200);
  expect((await client.post("/api/sessions", { date: "2026-05-01", notes: "written while running" })).status).toBe(201);
  expect(loosePermissions(dataDir), "while running").toEqual([]);
  child.kill("SIGTERM");
  expect(await exited).toBe(0);
  expect(fs.existsSync(path.join(dataDir, ".auth-secret"))).toBe(true);
  expect(loosePermissions(dataDir), "after stopping").toEqual([]);

  const backups = path.join(root, "backups");
  const file = path.join(backups, "borrowline.tar.gz");
  execFileSync("sh", underUmask0(`npm run --silent backup -- "${file}"`), { env: envFor(dataDir), stdio: "pipe" });
  expect(fs.statSync(file).mode & 0o777).toBe(0o600);
  expect(fs.statSync(backups).mode & 0o777).toBe(0o700);
  expect(loosePermissions(dataDir), "after the backup").toEqual([]);
}, 180_000);
