import type { AddressInfo } from "node:net";
import { createServer, type Server } from "node:http";
import { createSequelize } from "../db/sequelize";
import { initModels } from "../db/models";
import { createApp } from "./app";
import { warmReportWorker } from "./domain/report/render-in-worker";
import { buildAppContext, type AppContext } from "./context";
import { publicOrigin, type Env } from "./env";
import { createLogger } from "./logger";
import { appVersion } from "./version";

export type RunningServer = {
  url: string;
  port: number;
  context: AppContext;
  server: Server;
  /** Stops accepting requests, lets open ones finish, closes the database pool. */
  close(): Promise<void>;
};

/** Opens the database pool, builds the app and listens on env.HOST:env.PORT (0 = any free port). */
export async function startServer(
  env: Env,
  options: {
    webDist: string | null;
    rateLimits?: Partial<AppContext["rateLimits"]>;
    /**
     * Start the report worker and have it read its fonts once listening (1.5 to 4 s of one core),
     * so the first report after a start does not wait for them. Off for test servers, which
     * mostly draw no report and share the machine's cores.
     */
    warmReports?: boolean;
  },
): Promise<RunningServer> {
  const logger = createLogger(env);
  const sequelize = createSequelize(env.DATABASE_URL);
  initModels(sequelize);
  const context = buildAppContext({
    env,
    sequelize,
    logger,
    version: appVersion,
    webDist: options.webDist,
    rateLimits: options.rateLimits,
  });
  if (context.mailer.fake) {
    // No SMTP_URL: mail goes to the in-process fake server (see api/mail/fake-smtp-server.ts).
    await context.mailer.start();
    if (env.NODE_ENV === "production") {
      logger.warn("SMTP_URL is not set: mail is caught by the fake server and nobody receives it");
    }
  }
  const server = createServer(createApp(context));
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(env.PORT, env.HOST, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  if (options.warmReports) warmReportWorker();
  context.publicOrigin = publicOrigin(env, port);
  let closing: Promise<void> | null = null;
  return {
    url: publicOrigin(env, port),
    port,
    context,
    server,
    close() {
      closing ??= (async () => {
        await new Promise<void>((resolve) => {
          server.close(() => resolve());
          server.closeIdleConnections();
        });
        await context.mailer.close();
        await sequelize.close();
      })();
      return closing;
    },
  };
}
