import type { RequestHandler } from "express";
import { errors } from "../errors";

/**
 * Refuses a path whose percent-encoding does not decode (e.g. `%FF`, not UTF-8 on its own)
 * before any router or static file server tries it: they throw a URIError deep inside, which
 * would otherwise surface as a 500 or a bare "Bad Request".
 */
export const malformedPath: RequestHandler = (req, _res, next) => {
  try {
    decodeURIComponent(req.path);
  } catch {
    throw errors.badRequest(
      "The path has malformed percent-encoding (e.g. %FF); encode every character of the path as UTF-8.",
    );
  }
  next();
};
