import { expect, test } from "vitest";
import { nextTask } from "./next-task";

test("nextTask resolves in a later task: a task already queued runs first, a microtask does not wait for it", async () => {
  const order: string[] = [];
  setTimeout(() => order.push("queued task"), 0);
  const done = nextTask().then(() => order.push("after nextTask"));
  await Promise.resolve();
  order.push("microtask");
  await done;
  expect(order).toEqual(["microtask", "queued task", "after nextTask"]);
});

test("nextTask uses the browser's scheduler.yield() where there is one", async () => {
  const scheduler = { yield: () => Promise.resolve().then(() => calls++) };
  let calls = 0;
  (globalThis as { scheduler?: unknown }).scheduler = scheduler;
  try {
    await nextTask();
    expect(calls).toBe(1);
  } finally {
    delete (globalThis as { scheduler?: unknown }).scheduler;
  }
});
