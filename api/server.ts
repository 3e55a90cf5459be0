import type { AddressInfo } from "node:net";
import { createServer, type Server } from "node:http";
import { createSequelize } from "../db/sequelize";
import { initModels } from "../db/models";
import { createApp } from "./app";
import type { AppContext } from "./context";
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
export async function startServer(env: Env, options: { webDist: string | null }): Promise<RunningServer> {
  const logger = createLogger(env);
  const sequelize = createSequelize(env.DATABASE_URL);
  initModels(sequelize);
  const context: AppContext = { env, sequelize, logger, version: appVersion, webDist: options.webDist };
  const server = createServer(createApp(context));
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(env.PORT, env.HOST, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
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
        await sequelize.close();
      })();
      return closing;
    },
  };
}
