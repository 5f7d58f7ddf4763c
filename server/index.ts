// Entry point: `npm start` (built) and `npm run dev` (tsx watch + Vite middleware).
import { readEnv } from "./env";
import { serveBuiltClient, viteDevClient } from "./frontend";
import { start } from "./start";

const env = readEnv();
const dev = env.NODE_ENV === "development" ? await viteDevClient() : undefined;

try {
  const running = await start({ env, frontend: dev ? dev.mount : serveBuiltClient() });
  const shutdown = (signal: string) => {
    console.log(`${signal}: finishing in-flight requests and closing the database…`);
    const timer = setTimeout(() => process.exit(1), 10_000);
    timer.unref();
    Promise.all([running.close(), dev?.close()])
      .then(() => process.exit(0))
      .catch((err) => {
        console.error(err);
        process.exit(1);
      });
  };
  process.once("SIGTERM", () => shutdown("SIGTERM"));
  process.once("SIGINT", () => shutdown("SIGINT"));
  console.log(`Borrowline is running at ${env.BASE_URL ?? `http://localhost:${env.PORT}`}`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  await dev?.close();
  process.exit(1);
}
