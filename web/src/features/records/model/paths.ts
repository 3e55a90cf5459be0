/** The review area's addresses in the app (pages), and the record's PDF in the API. */

export const recordsPagePath = (workspaceId: string, projectId: string) =>
  `/workspaces/${workspaceId}/projects/${projectId}/records`;

export const recordPagePath = (workspaceId: string, projectId: string, recordId: string) =>
  `${recordsPagePath(workspaceId, projectId)}/${recordId}`;

/** The print page of a frozen record (its report as HTML with a print stylesheet). */
export const recordPrintPath = (workspaceId: string, projectId: string, recordId: string) =>
  `${recordPagePath(workspaceId, projectId, recordId)}/report`;

/** The PDF calculation report of a frozen record, built by the server. */
export const recordPdfPath = (workspaceId: string, projectId: string, recordId: string) =>
  `/api${recordPagePath(workspaceId, projectId, recordId)}/report.pdf`;
