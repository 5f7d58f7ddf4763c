// Helpers shared by the practice-log API tests (not a test file itself).
import { squadMembers, squads } from "../../server/db/schema";
import type { HttpClient } from "../setup/http";
import type { TestServer } from "../setup/server";

/** Squads are another engineer's API: tests insert the rows directly. */
export async function makeSquad(server: TestServer, coachId: string, playerIds: string[]): Promise<string> {
  const [squad] = await server.database.db.insert(squads).values({ coachId, name: "Test squad" }).returning({ id: squads.id });
  if (playerIds.length > 0)
    await server.database.db.insert(squadMembers).values(playerIds.map((playerId) => ({ squadId: squad!.id, playerId })));
  return squad!.id;
}

export async function newSession(client: HttpClient, body: Record<string, unknown> = { date: "2024-05-01" }): Promise<string> {
  const res = await client.post("/api/sessions", body);
  if (res.status !== 201) throw new Error(`session: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id as string;
}

export type PuttSpec = { distanceM: number; holed: boolean; missSide?: "left" | "right"; missLengthM?: number; breakType?: string };

export async function addPutts(client: HttpClient, sessionId: string, list: PuttSpec[]): Promise<string[]> {
  const ids: string[] = [];
  for (const p of list) {
    const res = await client.post(`/api/sessions/${sessionId}/putts`, p);
    if (res.status !== 201) throw new Error(`putt: ${res.status} ${JSON.stringify(res.body)}`);
    ids.push(res.body.id as string);
  }
  return ids;
}

/** `made` holed and `missed` missed putts from one distance. */
export function puttsAt(distanceM: number, made: number, missed: number): PuttSpec[] {
  return [
    ...Array.from({ length: made }, () => ({ distanceM, holed: true })),
    ...Array.from({ length: missed }, () => ({ distanceM, holed: false, missSide: "left" as const, missLengthM: 0.4 })),
  ];
}

export const OTHER_UUID = "00000000-0000-4000-8000-000000000000";
