// Browser tests run against the built client: build it once per run.
import { execFileSync } from "node:child_process";

export default function setup() {
  if (process.env.E2E_SKIP_BUILD === "1") return;
  // vitest sets NODE_ENV=test, and vite build then ships React's development build: test what `npm start` ships.
  const env = { ...process.env, NODE_ENV: "production" };
  // The client and the first pages drawn at build time ("/" and "/read"), as `npm run build` makes them (`.ci/run`
  // runs the same script beside its checks, then sets E2E_SKIP_BUILD).
  execFileSync("npm", ["run", "--silent", "build:client"], { stdio: "inherit", env });
}
