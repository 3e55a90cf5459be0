/**
 * SQL for the stamp of a project's comparison inputs: the project's counter and its workspace's
 * (the material library) from `comparison_stamps`, as "project:workspace" text, 0 for a scope
 * never changed since the counters were installed. PostgreSQL raises a counter in the same
 * commit as any change of an input (db/comparison-stamps.ts), so two reads with the same stamp
 * saw the same inputs. `projectId` and `workspaceId` are SQL expressions (columns or parameters).
 */
export function inputsStampSql(projectId: string, workspaceId: string): string {
  const counter = (scope: string) =>
    `coalesce((select cs.stamp from comparison_stamps cs where cs.scope_id = ${scope}), 0)`;
  return `concat(${counter(projectId)}, ':', ${counter(workspaceId)})`;
}
