import { expect, test } from "vitest";
import { OFFLINE_API_URL } from "./offline-cache";

const id = "6c9c2f0e-6f5e-4c1f-9d4e-0a1b2c3d4e5f";
const at = (path: string) => `https://borrowline.example${path}`;

test("the service worker keeps the logging screens' GETs: account, greens, sessions and their putts, ladder assignments", () => {
  for (const path of [
    "/api/me",
    "/api/greens",
    `/api/greens/${id}`,
    "/api/sessions?page=1&pageSize=50&sort=-date",
    `/api/sessions/${id}`,
    `/api/sessions/${id}/putts`,
    "/api/assignments?mine=1",
    `/api/assignments/${id}`,
  ]) {
    expect(OFFLINE_API_URL.test(at(path)), path).toBe(true);
  }
});

test("it keeps nothing else under /api: no auth, reads, stats, admin, exports or height maps", () => {
  for (const path of [
    "/api/auth/get-session",
    "/api/reads/solve",
    "/api/reads",
    "/api/stats/make-rates",
    "/api/admin/users",
    "/api/dev/mail",
    "/api/csv/putts/export",
    `/api/greens/${id}/height-map`,
    `/api/sessions/${id}/putts/extra`,
    "/api/merchandise",
    "/api/meeting",
    "/assets/index.js",
  ]) {
    expect(OFFLINE_API_URL.test(at(path)), path).toBe(false);
  }
});
