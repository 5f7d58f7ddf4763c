// Group commit for putt logging, the hot path at a club's peak (issue 12). Each putt posted while the database is
// busy writing the previous group waits for it and is then written with the others in ONE statement and one
// commit: a commit costs far more than a row (PGlite: about 1.6 ms for one putt alone, 0.3 ms a putt in tens).
// A putt posted to an idle database is written at once, so a lone golfer waits no longer than before.
//
// DataLoader does the collecting (its batchScheduleFn decides when a group is sent: when the write in progress
// ends). What each putt gets back is the same as before: its id when stored, or null when the statement stored
// nothing for it (a retried clientId, or a session that is not the player's), which the handler then explains.
import { randomUUID } from "node:crypto";
import DataLoader from "dataloader";
import { sql } from "drizzle-orm";
import type { Db } from "./client";
import { practiceSessions, putts } from "./schema";

export type NewPutt = {
  sessionId: string;
  playerId: string;
  clientId: string | null;
  distanceM: number;
  holed: boolean;
  missSide: string | null;
  missLengthM: number | null;
  breakType: string | null;
};

/** At most this many putts in one statement (10 bind parameters a row; far under PostgreSQL's 65 535). */
export const MAX_GROUP = 200;

type Rows = { rows: { id: string }[] };

/**
 * One statement for the group: every putt whose session is its player's is stored, in the order posted (each row
 * its own clock_timestamp(), a microsecond apart at least, so two taps in one group keep their order), and a clientId seen before stores nothing.
 */
async function insertGroup(db: Db, group: readonly NewPutt[]): Promise<(string | null)[]> {
  const ids = group.map(() => randomUUID());
  const values = sql.join(
    group.map(
      (p, i) =>
        sql`(${i}::int, ${ids[i]}::uuid, ${p.sessionId}::uuid, ${p.playerId}::text, ${p.clientId}::uuid, ${p.distanceM}::float8, ${p.holed}::boolean, ${p.missSide}::text, ${p.missLengthM}::float8, ${p.breakType}::text)`,
    ),
    sql`, `,
  );
  const result = (await db.execute(sql`
    insert into ${putts} (id, session_id, player_id, client_id, distance_m, holed, miss_side, miss_length_m, break_type, created_at)
    select v.id, v.session_id, v.player_id, v.client_id, v.distance_m, v.holed, v.miss_side, v.miss_length_m, v.break_type,
           clock_timestamp() + v.n * interval '1 microsecond'
    from (values ${values}) as v(n, id, session_id, player_id, client_id, distance_m, holed, miss_side, miss_length_m, break_type)
    join ${practiceSessions} s on s.id = v.session_id and s.player_id = v.player_id
    order by v.n
    on conflict (player_id, client_id) do nothing
    returning id`)) as unknown as Rows;
  const stored = new Set(result.rows.map((r) => r.id));
  return ids.map((id) => (stored.has(id) ? id : null));
}

/** Stores putts in groups; `write(putt)` answers the new putt's id, or null when nothing was stored for it. */
export function puttWriter(db: Db, options: { maxGroup?: number } = {}) {
  // The write in progress (settled either way): the next group is sent when it ends.
  let writing: Promise<unknown> = Promise.resolve();
  const loader = new DataLoader<NewPutt, string | null>(
    async (group) => {
      const run = insertGroup(db, group).catch(async (error: unknown) => {
        // One putt the database refuses must not take the others down with it: each is tried alone, and only
        // the refused one fails. One after another, so they keep the order posted (statements sent together may
        // commit in any order on a pool of connections).
        if (group.length === 1) throw error;
        const results: (string | null | Error)[] = [];
        for (const p of group) {
          results.push(
            await insertGroup(db, [p]).then(
              ([id]) => id ?? null,
              (e: unknown) => toError(e),
            ),
          );
        }
        return results;
      });
      writing = run.catch(() => undefined);
      return await run;
    },
    {
      cache: false,
      maxBatchSize: options.maxGroup ?? MAX_GROUP,
      batchScheduleFn: (send) => void writing.then(() => setImmediate(send)),
    },
  );
  return { write: (putt: NewPutt) => loader.load(putt) };
}

const toError = (e: unknown) => (e instanceof Error ? e : new Error(String(e)));

export type PuttWriter = ReturnType<typeof puttWriter>;
