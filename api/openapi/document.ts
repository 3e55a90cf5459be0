import { z } from "zod";
import { routeKey, type AnyRoute } from "./registry";

type JsonSchema = Record<string, unknown>;

const errorBodySchema = z.object({
  error: z.object({
    id: z.string().describe("Stable id clients may switch on, e.g. invalid_input, last_owner."),
    message: z.string(),
    details: z.unknown().optional().describe("For invalid_input: [{ path, message }] per field."),
  }),
});

function jsonSchema(schema: z.ZodType, io: "input" | "output"): JsonSchema {
  const { $schema: _ignored, ...rest } = z.toJSONSchema(schema, { io, unrepresentable: "any" }) as JsonSchema;
  return rest;
}

/** Path or query parameters from an object schema's properties. */
function parameters(schema: z.ZodType | undefined, where: "path" | "query") {
  if (!schema) return [];
  const json = jsonSchema(schema, "input") as {
    properties?: Record<string, JsonSchema>;
    required?: string[];
  };
  return Object.entries(json.properties ?? {}).map(([name, property]) => ({
    name,
    in: where,
    required: where === "path" || (json.required ?? []).includes(name),
    schema: property,
  }));
}

/** The error answers a route can give, from its access rule, its inputs and its own list. */
function errorResponses(route: AnyRoute): Record<string, { description: string }> {
  const out: Record<string, string> = {};
  const request = route.request ?? {};
  if (request.params || request.query || request.body)
    out[400] = "Input not valid; details list each field's path.";
  if (route.access.kind !== "public") out[401] = "Not signed in.";
  if (route.method !== "get") out[403] = "The Origin header is missing or foreign (CSRF check).";
  if (route.access.kind === "member") {
    out[403] = `The caller's role is below ${route.access.role}${route.method !== "get" ? ", or the Origin check failed" : ""}.`;
    out[404] = "No such workspace, or the caller is not a member of it.";
  }
  if (route.rateLimit) out[429] = "Too many attempts; see the Retry-After header (seconds).";
  for (const [status, description] of Object.entries(route.errors ?? {})) {
    out[status] = out[status] ? `${out[status]} Or: ${description}` : description;
  }
  return Object.fromEntries(
    Object.entries(out).map(([status, description]) => [
      status,
      { description, content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } } },
    ]),
  );
}

/**
 * The OpenAPI 3.1 document of every registered route, generated from the same zod schemas
 * that validate the requests (zod 4's JSON Schema output is draft 2020-12, which 3.1 uses).
 * `x-required-role` carries the access rule for tools and the role-matrix test.
 */
export function buildOpenApiDocument(routes: AnyRoute[], info: { version: string; serverUrl: string }) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const route of routes) {
    const request = route.request ?? {};
    const responses: Record<string, unknown> = {};
    for (const [status, response] of Object.entries(route.responses)) {
      responses[status] = response.schema
        ? {
            description: response.description,
            content: {
              [response.contentType ?? "application/json"]: { schema: jsonSchema(response.schema, "output") },
            },
          }
        : { description: response.description };
    }
    Object.assign(responses, errorResponses(route));
    const operation: Record<string, unknown> = {
      operationId: routeKey(route).replace(/[^A-Za-z0-9]+(.)?/g, (_m, c: string | undefined) =>
        c ? c.toUpperCase() : "",
      ),
      summary: route.summary,
      tags: [route.tag],
      "x-required-role": route.access.kind === "member" ? route.access.role : route.access.kind,
      parameters: [...parameters(request.params, "path"), ...parameters(request.query, "query")],
      responses,
    };
    if (route.description) operation.description = route.description;
    if (route.access.kind !== "public") operation.security = [{ sessionCookie: [] }];
    if (request.body) {
      operation.requestBody = {
        required: true,
        content: { "application/json": { schema: jsonSchema(request.body, "input") } },
      };
    }
    (paths[`/api${route.path}`] ??= {})[route.method] = operation;
  }
  return {
    openapi: "3.1.0",
    info: {
      title: "Sigmacube API",
      version: info.version,
      description:
        "Accounts, team workspaces, roles, invitations and share links. State-changing requests must send an Origin header equal to the app's origin.",
    },
    servers: [{ url: info.serverUrl }],
    paths,
    components: {
      schemas: { Error: jsonSchema(errorBodySchema, "output") },
      securitySchemes: { sessionCookie: { type: "apiKey", in: "cookie", name: "sigmacube_session" } },
    },
  };
}
