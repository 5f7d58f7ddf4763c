// npm run create-admin -- <email> [name]: makes an admin (or promotes an existing user). The only way to get one.
import crypto from "node:crypto";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { readEnv } from "../env";
import { start } from "../start";
import { user } from "../db/schema";
import { createAccount } from "../db/seed";
import { usePrivateUmask } from "../lib/private-files";

usePrivateUmask();

const [emailArg, ...nameParts] = process.argv.slice(2);
const email = z.email().safeParse(emailArg);
if (!email.success) {
  console.error("Usage: npm run create-admin -- <email> [name]");
  process.exit(2);
}

const env = { ...readEnv(), PORT: 0, HOST: "127.0.0.1", SEED: "0" as const, LOG_LEVEL: "warn" as const };
const running = await start({ env });
try {
  const db = running.database.db;
  const [found] = await db.select().from(user).where(eq(user.email, email.data));
  if (found) {
    await db.update(user).set({ role: "admin" }).where(eq(user.id, found.id));
    console.log(`${email.data} is now an admin.`);
  } else {
    const password = crypto.randomBytes(12).toString("base64url");
    await createAccount(db, { email: email.data, name: nameParts.join(" ") || "Administrator" }, "admin", password);
    console.log(`Created admin ${email.data} with the password: ${password}\nSign in and change it.`);
  }
} finally {
  await running.close();
}
