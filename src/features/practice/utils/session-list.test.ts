import { expect, test } from "vitest";
import type { Putt } from "#shared/schemas/putts";
import type { NewPutt } from "../api/add-putt";
import { listedPutts } from "./session-list";

const S = "s1";
const stored = (id: string, clientId: string | null, createdAt: string): Putt => ({
  id,
  sessionId: S,
  date: "2024-05-01",
  distanceM: 2,
  holed: true,
  missSide: null,
  missLengthM: null,
  breakType: null,
  clientId,
  createdAt,
});
const queued = (clientId: string, loggedAt: string, paused = true, sessionId = S): { putt: NewPutt; paused: boolean } => ({
  putt: { sessionId, clientId, distanceM: 1, holed: false, loggedAt },
  paused,
});

test("queued putts the cache lacks (restored after a reload) are listed once, in logging order, as waiting", () => {
  const rows = listedPutts(
    [stored("a", "c-a", "2024-05-01T10:00:00Z"), stored("pending:c-b", "c-b", "2024-05-01T10:01:00Z")],
    [
      queued("c-b", "2024-05-01T10:01:00Z", false),
      queued("c-c", "2024-05-01T10:02:00Z"),
      queued("c-x", "2024-05-01T09:00:00Z", true, "other"),
    ],
    S,
  );
  expect(rows.map((r) => [r.clientId, r.saved])).toEqual([
    ["c-a", "yes"],
    ["c-b", "sending"],
    ["c-c", "waiting"],
  ]);
  expect(rows[2]).toMatchObject({ id: "pending:c-c", holed: false, date: "2024-05-01" });
});
