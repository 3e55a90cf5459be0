import { z } from "zod";
import { projectParamsSchema } from "../../../core/contract/projects";
import { recordContentSchema, recordParamsSchema } from "../../../core/contract/records";
import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { draftReportContentHandler, draftReportPdfHandler, recordReportPdfHandler } from "./handlers";

const tag = "report";

/** The calculation report: a project's draft (as a PDF, and as content for the print page) and a frozen record's PDF. */
export function reportRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects/{projectId}/report.pdf",
      tag,
      summary:
        "The draft calculation report of the project as it is now (PDF, watermarked “DRAFT — not checked”)",
      description:
        "Cover, scope, inputs with units and sources, method, one section per location (state, principal stresses and directions, Mohr's circles, checks per case), the comparison with the governing case, calculator inputs and the cautions. Not a frozen record: nobody has checked it.",
      access: { kind: "member", role: "viewer" },
      request: { params: projectParamsSchema },
      responses: {
        200: {
          description: "The PDF, as an attachment.",
          contentType: "application/pdf",
          schema: z.string().meta({ format: "binary" }),
        },
      },
      handler: draftReportPdfHandler(context),
    }),
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects/{projectId}/report-content",
      tag,
      summary: "What the draft report is drawn from: the project's content as a record would freeze it",
      access: { kind: "member", role: "viewer" },
      request: { params: projectParamsSchema },
      responses: { 200: { description: "The draft's content.", schema: recordContentSchema } },
      handler: draftReportContentHandler(context),
    }),
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects/{projectId}/records/{recordId}/report.pdf",
      tag,
      summary: "The calculation report of a frozen record (PDF), exactly as the record was frozen",
      description:
        "Drawn from the record's frozen content, so it does not change when the project, the material library or the engine changes afterwards. The cover carries the record id, hash, revision table, status and signatures (originator, checkers, approver with dates).",
      access: { kind: "member", role: "viewer" },
      request: { params: recordParamsSchema },
      responses: {
        200: {
          description: "The PDF, as an attachment.",
          contentType: "application/pdf",
          schema: z.string().meta({ format: "binary" }),
        },
      },
      handler: recordReportPdfHandler,
    }),
  ];
}
