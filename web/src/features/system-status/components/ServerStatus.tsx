import { useHealth } from "../api/get-health";

/** A quiet line in the footer: version, and whether the server and its database answer. */
export function ServerStatus() {
  const health = useHealth();
  if (health.isPending) return <span className="text-graphite-faint">checking the server…</span>;
  if (health.isError) {
    return (
      <span className="text-fail" role="status">
        ✗ server not reachable: {health.error.message}
      </span>
    );
  }
  const { ok, version, database } = health.data;
  return (
    <span role="status" className={ok ? "text-graphite-soft" : "text-fail"}>
      {ok ? "✓" : "✗"} Sigmacube <span className="num">{version}</span> · database{" "}
      {database.ok ? (
        <>
          PostgreSQL <span className="num">{database.serverVersion}</span>
        </>
      ) : (
        "not answering"
      )}
    </span>
  );
}
