import type { RequestHandler } from "express";
import type { z } from "zod";
import { errors } from "../errors";
import { NUL_MESSAGE, nulCharacterPaths } from "./nul-characters";

/** Where a piece of input comes from; body fields are reported by their own path ("email"), others prefixed ("params.workspaceId"). */
export type InputPart = "params" | "query" | "body";

/** Body fields are reported by their own path ("email"), others prefixed ("params.workspaceId"). */
const reported = (part: InputPart, path: string) =>
  part === "body" ? path || "body" : [part, path].filter(Boolean).join(".");

/** The parsed input that handlers read (`res.locals.input`); they never touch req.params/query/body. */
export type ParsedInput = { params: unknown; query: unknown; body: unknown };

/**
 * Parses the named parts of the request with their schemas and stores the results in
 * `res.locals.input`; any problem becomes one 400 `invalid_input` listing every field.
 * Text holding a NUL character is refused before its part is parsed.
 * Parts without a schema are stored as `{}`.
 */
export function validate(schemas: Partial<Record<InputPart, z.ZodType>>, parts: InputPart[]): RequestHandler {
  return (req, res, next) => {
    const input = (res.locals.input ??= { params: {}, query: {}, body: {} }) as ParsedInput;
    const problems: { path: string; message: string }[] = [];
    for (const part of parts) {
      const schema = schemas[part];
      if (!schema) continue;
      const raw = part === "params" ? req.params : part === "query" ? req.query : (req.body ?? {});
      const nulPaths = nulCharacterPaths(raw);
      if (nulPaths.length) {
        for (const path of nulPaths)
          problems.push({ path: reported(part, path.join(".")), message: NUL_MESSAGE });
        continue;
      }
      const result = schema.safeParse(raw);
      if (result.success) {
        input[part] = result.data;
      } else {
        for (const issue of result.error.issues) {
          problems.push({ path: reported(part, issue.path.map(String).join(".")), message: issue.message });
        }
      }
    }
    if (problems.length) throw errors.invalidInput(problems);
    next();
  };
}
