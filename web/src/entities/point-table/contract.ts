/**
 * The point-table wire shapes as this browser reads them: the server's own zod schemas
 * (core/contract/point-tables.ts), so a field the server drops or renames fails here at once,
 * and only what the browser needs on top of them.
 */
import type { z } from "zod";
import {
  POINT_ID_KINDS,
  pointTableColumnsSchema,
  pointTableSchema,
  type CreatePointTableBody as ServerCreateBody,
  type PointTableColumnsInput,
} from "../../../../core/contract/point-tables";

export {
  keepPointsResponseSchema,
  pointTableDetailSchema,
  pointTableIdsSchema,
  pointTableSchema,
  type PointTableDetailView,
  type PointTableEvaluationView,
  type PointTableView,
} from "../../../../core/contract/point-tables";

/** The layout as the browser sends it: every field stated (the server's defaults are not relied on). */
export type PointTableLayoutBody = z.output<typeof pointTableSchema.shape.layout>;
export type PointTableColumnsBody = PointTableColumnsInput;
export type IdKind = (typeof POINT_ID_KINDS)[number];

/** What POST …/point-tables sends before the file's bytes follow. */
export type CreatePointTableBody = Omit<ServerCreateBody, "layout" | "columns" | "idKind"> & {
  layout: PointTableLayoutBody;
  columns: PointTableColumnsBody;
  idKind: IdKind;
};

/**
 * A stored table as the page lists it. The server's list types the mapping loosely (any column
 * name); the browser offers a stored mapping again for a new file, so it reads it with the
 * declaration's own schema (the six components, optional id and x y z), which every stored
 * mapping passed when it was declared.
 */
export const storedPointTableSchema = pointTableSchema.extend({ columns: pointTableColumnsSchema });
export type StoredPointTable = z.infer<typeof storedPointTableSchema>;
export const storedPointTableListSchema = storedPointTableSchema.array();

/** What PUT …/content answers once the server has read and evaluated the bytes: the stored table. */
export const uploadSummarySchema = pointTableSchema;
export type UploadSummary = z.infer<typeof uploadSummarySchema>;
