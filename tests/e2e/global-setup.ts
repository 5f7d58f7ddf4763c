// Browser tests run against the built client: build it once per run.
import { execFileSync } from "node:child_process";

export default function setup() {
  if (process.env.E2E_SKIP_BUILD === "1") return;
  // vitest sets NODE_ENV=test, and vite build then ships React's development build: test what `npm start` ships.
  execFileSync("npx", ["vite", "build", "--logLevel", "warn"], { stdio: "inherit", env: { ...process.env, NODE_ENV: "production" } });
}
