import { randomUUID } from "node:crypto";
import type { Logger } from "pino";
import { pinoHttp } from "pino-http";

const REQUEST_ID_HEADER = "x-request-id";

/**
 * Logs each request with an id that is echoed in `X-Request-Id`, so a user's error report
 * can be matched to the server's log line. A well-formed incoming id (from a proxy) is kept.
 */
export function requestLogging(logger: Logger) {
  return pinoHttp({
    logger,
    genReqId(req, res) {
      const incoming = req.headers[REQUEST_ID_HEADER];
      const id = typeof incoming === "string" && /^[\w-]{8,100}$/.test(incoming) ? incoming : randomUUID();
      res.setHeader("X-Request-Id", id);
      return id;
    },
    customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? "error" : "info"),
    serializers: {
      req: (req: { id: string; method: string; url: string }) => ({
        id: req.id,
        method: req.method,
        url: req.url,
      }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}
