import type { AppContext } from "../../context";
import { buildOpenApiDocument } from "../../openapi/document";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { openApiDocumentSchema } from "./schema";

/** `GET /api/openapi.json`; `allRoutes` is read at request time so the document lists itself too. */
export function openApiRoutes(context: AppContext, allRoutes: () => AnyRoute[]): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/openapi.json",
      tag: "meta",
      summary: "This API's OpenAPI 3.1 document",
      access: { kind: "public" },
      responses: { 200: { description: "The document.", schema: openApiDocumentSchema } },
      handler: (_req, res) => {
        res.json(
          buildOpenApiDocument(allRoutes(), { version: context.version, serverUrl: context.publicOrigin }),
        );
      },
    }),
  ];
}
