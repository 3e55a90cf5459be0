import type { RequestHandler } from "express";
import { isLoopback } from "../../env";
import { errors } from "../../errors";

/** The paths of the development mailbox: the page (served by the app's history fallback) and its API. */
export const MAILBOX_PATHS = ["/api/dev/mailbox", "/dev/mailbox"];

/** Headers a reverse proxy adds: a request carrying one came from further away than the socket says. */
const FORWARDING_HEADERS = ["x-forwarded-for", "forwarded", "x-real-ip"];

/**
 * The fake mailbox holds password-reset and invitation links: whoever reads it can take
 * an account over. Only a client on this machine may, judged by the socket's own remote
 * address (never X-Forwarded-For, which the client writes). A request that passed through
 * a proxy on this machine is turned away too, since the proxy's socket is loopback whoever
 * sent it. Everyone else gets the same 404 as for a path that does not exist.
 */
export const loopbackOnly: RequestHandler = (req, _res, next) => {
  const address = req.socket.remoteAddress;
  const proxied = FORWARDING_HEADERS.some((name) => req.headers[name] !== undefined);
  if (address && isLoopback(address) && !proxied) return next();
  next(errors.notFound("This page"));
};
