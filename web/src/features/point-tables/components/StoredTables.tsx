import { Link } from "react-router-dom";
import type { StoredPointTable } from "../../../entities/point-table/contract";
import { pointTableDownloadHref } from "../../../entities/point-table/queries";
import { ToolButton } from "../../../components/ToolButton";

/**
 * The load case's stored tables: name, size, points, rows left out, when; open the results
 * (`?table=<id>`, so the link can be copied), download, or delete (editors).
 */
export function StoredTables({
  ids,
  tables,
  canEdit,
  openTableId,
  onDelete,
}: {
  ids: { workspaceId: string; projectId: string; caseId: string };
  tables: StoredPointTable[];
  canEdit: boolean;
  openTableId: string | null;
  onDelete: (tableId: string) => void;
}) {
  if (tables.length === 0)
    return <p className="p-3 text-sm text-graphite-soft">No point table stored in this load case yet.</p>;
  return (
    <div className="overflow-x-auto" role="region" aria-label="Stored point tables" tabIndex={0}>
      <table className="w-full border-collapse text-[14px]" data-testid="stored-tables">
        <thead>
          <tr className="border-b border-rule text-left text-[13px] text-graphite-soft">
            <th scope="col" className="px-3 py-1">
              file
            </th>
            <th scope="col" className="px-3 py-1 text-right">
              size
            </th>
            <th scope="col" className="px-3 py-1 text-right">
              points
            </th>
            <th scope="col" className="px-3 py-1 text-right">
              rows left out
            </th>
            <th scope="col" className="px-3 py-1">
              stored
            </th>
            <th scope="col" className="hidden px-3 py-1 sm:table-cell">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {tables.map((t) => (
            <tr key={t.id} className="border-b border-rule last:border-0">
              <td className="px-3 py-1">
                {t.fileName}
                {/* phone-wide, the actions sit under the name, where no sideways scroll hides them */}
                <div className="space-x-2 whitespace-nowrap sm:hidden">
                  <TableActions
                    ids={ids}
                    table={t}
                    canEdit={canEdit}
                    openTableId={openTableId}
                    onDelete={onDelete}
                  />
                </div>
              </td>
              <td className="num px-3 py-1 text-right">{(t.sizeBytes / 1e6).toFixed(2)} MB</td>
              <td className="num px-3 py-1 text-right">{t.pointCount.toLocaleString("en-US")}</td>
              <td className="num px-3 py-1 text-right">{t.badRows.count.toLocaleString("en-US")}</td>
              <td className="num px-3 py-1">{t.createdAt.slice(0, 16).replace("T", " ")} UTC</td>
              <td className="hidden space-x-2 whitespace-nowrap px-3 py-1 text-right sm:table-cell">
                <TableActions
                  ids={ids}
                  table={t}
                  canEdit={canEdit}
                  openTableId={openTableId}
                  onDelete={onDelete}
                />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Open results (ready tables), download, and delete for editors. */
function TableActions({
  ids,
  table,
  canEdit,
  openTableId,
  onDelete,
}: {
  ids: { workspaceId: string; projectId: string; caseId: string };
  table: StoredPointTable;
  canEdit: boolean;
  openTableId: string | null;
  onDelete: (tableId: string) => void;
}) {
  return (
    <>
      {table.status === "ready" && (
        <Link
          to={`?table=${table.id}`}
          aria-label={`Open the results of ${table.fileName}`}
          aria-current={table.id === openTableId ? "true" : undefined}
          className="text-ink underline-offset-2 hover:underline aria-[current=true]:font-semibold"
        >
          Open results
        </Link>
      )}
      <a
        href={pointTableDownloadHref(ids.workspaceId, ids.projectId, ids.caseId, table.id)}
        download
        className="text-ink underline-offset-2 hover:underline"
      >
        Download
      </a>
      {canEdit && (
        <ToolButton aria-label={`Delete point table ${table.fileName}`} onClick={() => onDelete(table.id)}>
          Delete
        </ToolButton>
      )}
    </>
  );
}
