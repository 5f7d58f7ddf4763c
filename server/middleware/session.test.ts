// loadSession asks better-auth once per Cookie header within the trust window, never for a request without
// cookies, and again once the window has passed (so a ban or sign-out still reaches every route in time).
import { expect, test } from "vitest";
import type { Request, Response } from "express";
import type { Auth } from "../auth";
import { loadSession, sessionMemo } from "./session";

function fakeAuth(user: { banned?: boolean; role?: string } | null) {
  const asked: string[] = [];
  const auth = {
    api: {
      getSession: async ({ headers }: { headers: Headers }) => {
        asked.push(headers.get("cookie") ?? "");
        return user
          ? {
              user: {
                id: "u1",
                name: "Ivo",
                email: "ivo@example.test",
                role: user.role ?? "player",
                emailVerified: true,
                banned: user.banned ?? false,
              },
            }
          : null;
      },
    },
  } as unknown as Auth;
  return { auth, asked };
}

async function run(handler: ReturnType<typeof loadSession>, cookie?: string) {
  const req = { headers: cookie ? { cookie } : {} } as Request;
  await new Promise<void>((resolve, reject) => {
    const out = handler(req, {} as Response, (err?: unknown) => (err ? reject(err) : resolve()));
    void Promise.resolve(out).catch(reject);
  });
  return req.user;
}

test("one session lookup per cookie header within the window; none without cookies", async () => {
  const { auth, asked } = fakeAuth({});
  const handler = loadSession(auth, sessionMemo({ ttlMs: 60_000 }));
  expect(await run(handler)).toBeNull();
  expect(asked).toEqual([]);
  const first = await run(handler, "s=one");
  const again = await run(handler, "s=one");
  expect(first).toMatchObject({ id: "u1", role: "player" });
  expect(again).toEqual(first);
  await run(handler, "s=two");
  expect(asked).toEqual(["s=one", "s=two"]);
});

test("past the window (never longer) the session is asked for again; a banned user is nobody", async () => {
  const { auth, asked } = fakeAuth({ banned: true });
  const handler = loadSession(auth, sessionMemo({ ttlMs: 1 }));
  expect(await run(handler, "s=one")).toBeNull();
  await new Promise((r) => setTimeout(r, 20));
  expect(await run(handler, "s=one")).toBeNull();
  expect(asked).toEqual(["s=one", "s=one"]);
});

test("an unknown role reads as player", async () => {
  const { auth } = fakeAuth({ role: "superuser" });
  expect(await run(loadSession(auth, sessionMemo()), "s=x")).toMatchObject({ role: "player" });
});

test("the memo holds at most its byte budget, however many and however long the cookie headers sent", async () => {
  const { auth } = fakeAuth(null);
  const memo = sessionMemo({ maxBytes: 64 * 1024 });
  const handler = loadSession(auth, memo);
  for (let i = 0; i < 200; i++) await run(handler, `junk${i}=${"x".repeat(8_000)}`);
  const held = [...memo.keys()].reduce((bytes, cookie) => bytes + cookie.length, 0);
  expect(held).toBeLessThanOrEqual(64 * 1024);
  expect(memo.size).toBeGreaterThan(0);
});
