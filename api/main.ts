/**
 * Entry point of one API process: reads the environment, listens, and shuts down cleanly
 * on SIGINT/SIGTERM. Keeps no state that another process behind the same load balancer
 * would need: sessions, rate limits and data live in PostgreSQL.
 *
 * Migrations are not run here (several processes may start at once); `npm start` and
 * `npm run db:migrate` run them.
 */
import path from "node:path";
import { fileURLToPath } from "node:url";
import { EnvError, isLoopback, parseEnv } from "./env";
import { startServer } from "./server";

const defaultWebDist = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../dist/web");

try {
  const env = parseEnv(process.env);
  const running = await startServer(env, {
    // WEB_DIST="" serves the API only (npm run dev, where Vite serves the app).
    webDist: process.env.WEB_DIST === "" ? null : (process.env.WEB_DIST ?? defaultWebDist),
    warmReports: true,
  });
  const listening = `http://${env.HOST}:${running.port}`;
  running.context.logger.info({ listening, publicOrigin: running.url }, "listening");
  console.log(`Sigmacube API listening on ${listening}`);
  if (running.context.mailer.fake && !isLoopback(env.HOST)) {
    // Allowed only with SIGMACUBE_FAKE_MAILBOX=1 (parseEnv refuses it otherwise).
    running.context.logger.warn(
      { host: env.HOST },
      "no SMTP_URL: mail goes to the fake mailbox, which only clients on this machine can read",
    );
  }
  const stop = (signal: string) => {
    running.context.logger.info({ signal }, "shutting down");
    void running.close().then(() => process.exit(0));
  };
  process.once("SIGINT", stop);
  process.once("SIGTERM", stop);
} catch (error) {
  console.error(error instanceof EnvError ? error.message : error);
  process.exit(1);
}
