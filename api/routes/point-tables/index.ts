import { loadCaseParamsSchema } from "../../../core/contract/load-cases";
import {
  createPointTableBodySchema,
  keepPointsBodySchema,
  keepPointsResponseSchema,
  pointTableDetailSchema,
  pointTableIdsSchema,
  pointTableListSchema,
  pointTableParamsSchema,
  pointTableSchema,
} from "../../../core/contract/point-tables";
import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  createPointTableHandler,
  deletePointTableHandler,
  downloadHandler,
  getColumnsHandler,
  getIdsHandler,
  getPointTableHandler,
  listPointTablesHandler,
  putContentHandler,
} from "./handlers";
import { keepPointsHandler } from "./keep";

const tag = "point-tables";
const base = "/workspaces/{workspaceId}/projects/{projectId}/load-cases/{loadCaseId}/point-tables";
const one = `${base}/{tableId}`;
const awaiting = { 409: "The table has no points yet (awaiting_content): send its file first." };

/** Finite-element point tables of a load case, under …/load-cases/{loadCaseId}/point-tables. */
export function pointTableRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: base,
      tag,
      summary: "A load case's point tables, newest first, each with its evaluation summary",
      access: { kind: "member", role: "viewer" },
      request: { params: loadCaseParamsSchema },
      responses: { 200: { description: "The tables.", schema: pointTableListSchema } },
      handler: listPointTablesHandler,
    }),
    defineRoute({
      method: "post",
      path: base,
      tag,
      summary:
        "Declare a point table: the file's name, size and SHA-256, its layout, column mapping and unit",
      description:
        "The file's text follows with PUT …/{tableId}/content. Columns are 0-based; the six components are required, id and x y z optional.",
      access: { kind: "member", role: "editor" },
      request: { params: loadCaseParamsSchema, body: createPointTableBodySchema },
      responses: { 201: { description: "The table, awaiting its content.", schema: pointTableSchema } },
      errors: {
        400: "Or: the load case or project holds its most point tables (point_table_limit).",
        413: "The file is larger than a point table may be (point_table_too_large).",
      },
      handler: createPointTableHandler(context),
    }),
    defineRoute({
      method: "put",
      path: `${one}/content`,
      tag,
      summary: "Send the declared file's bytes (text/plain, text/csv or application/octet-stream), streamed",
      description:
        "Parsed as it arrives; its size and SHA-256 must match the declaration (400 naming sizeBytes or sha256). Bad rows are left out and reported by line. Answers the table with its evaluation summary.",
      access: { kind: "member", role: "editor" },
      request: { params: pointTableParamsSchema },
      responses: { 200: { description: "The stored, evaluated table.", schema: pointTableSchema } },
      errors: {
        409: "The table already holds its points (content_present).",
        413: "The file has more rows than a point table may (point_table_too_large).",
        415: "The Content-Type is not one of text/plain, text/csv, application/octet-stream.",
      },
      handler: putContentHandler(context),
    }),
    defineRoute({
      method: "get",
      path: one,
      tag,
      summary: "One point table with its whole evaluation: per criterion, histogram, worst 100 points",
      access: { kind: "member", role: "viewer" },
      request: { params: pointTableParamsSchema },
      responses: { 200: { description: "The table.", schema: pointTableDetailSchema } },
      handler: getPointTableHandler,
    }),
    defineRoute({
      method: "get",
      path: `${one}/columns`,
      tag,
      summary: "The points as binary columns (application/octet-stream, X-Point-Count header)",
      description:
        "Little-endian float64, one column after another: xx yy zz xy yz zx (Pa), then x y z (NaN without coordinates).",
      access: { kind: "member", role: "viewer" },
      request: { params: pointTableParamsSchema },
      responses: { 200: { description: "9 × 8 × X-Point-Count bytes." } },
      errors: awaiting,
      handler: getColumnsHandler,
    }),
    defineRoute({
      method: "get",
      path: `${one}/ids`,
      tag,
      summary: "The point ids in table order (1…n when no id column is mapped)",
      access: { kind: "member", role: "viewer" },
      request: { params: pointTableParamsSchema },
      responses: { 200: { description: "The ids.", schema: pointTableIdsSchema } },
      errors: awaiting,
      handler: getIdsHandler,
    }),
    defineRoute({
      method: "get",
      path: `${one}/download`,
      tag,
      summary: "The table again as a CSV (text/csv) under the original file name",
      access: { kind: "member", role: "viewer" },
      request: { params: pointTableParamsSchema },
      responses: {
        200: { description: "id, x y z when present, then xx yy zz xy yz zx in the table's unit." },
      },
      errors: awaiting,
      handler: downloadHandler,
    }),
    defineRoute({
      method: "delete",
      path: one,
      tag,
      summary: "Delete a point table and its points",
      access: { kind: "member", role: "editor" },
      request: { params: pointTableParamsSchema },
      responses: { 204: { description: "Deleted." } },
      handler: deletePointTableHandler(context),
    }),
    defineRoute({
      method: "post",
      path: `${one}/keep`,
      tag,
      summary:
        "Keep points as project locations, their states saved in this load case (finite-element point)",
      access: { kind: "member", role: "editor" },
      request: { params: pointTableParamsSchema, body: keepPointsBodySchema },
      responses: { 201: { description: "The new locations.", schema: keepPointsResponseSchema } },
      errors: {
        ...awaiting,
        400: "Or: a point id the table does not hold, or the project's location limit.",
      },
      handler: keepPointsHandler(context),
    }),
  ];
}
