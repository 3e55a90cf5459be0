import express, { type RequestHandler } from "express";
import { errors } from "../errors";

/** Charset labels that mean UTF-8 (WHATWG Encoding Standard, "UTF-8" labels). */
const UTF8_LABELS = new Set(["utf-8", "utf8", "unicode-1-1-utf-8"]);

/**
 * The JSON body parser for /api. JSON travels in UTF-8 (RFC 8259 §8.1); the parser itself
 * would also accept UTF-16 and friends, so any other declared charset is refused with 415
 * before it reads a byte.
 */
export function jsonBody(limit: string): RequestHandler {
  const parse = express.json({ limit });
  return (req, res, next) => {
    const charset = /;\s*charset\s*=\s*"?([^";\s]*)/i.exec(req.headers["content-type"] ?? "")?.[1];
    if (charset !== undefined && !UTF8_LABELS.has(charset.toLowerCase()) && req.is("application/json")) {
      throw errors.unsupportedMediaType(
        `The body's charset "${charset}" is not accepted; send JSON in UTF-8 (Content-Type: application/json; charset=utf-8).`,
      );
    }
    parse(req, res, next);
  };
}
