/** A date as engineers write it on a sheet: 2026-12-01 (UTC would surprise; the browser's zone is used). */
export function formatDate(iso: string | null): string {
  if (!iso) return "—";
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/**
 * "3 min ago", "5 h ago", or the date: how recently a member was active, rounded to the minute.
 * @param now the time it is (milliseconds since 1970), the clock's by default
 */
export function formatActivity(iso: string | null, now: number = Date.now()): string {
  if (!iso) return "not yet";
  const minutes = Math.round((now - new Date(iso).getTime()) / 60_000);
  if (minutes < 1) return "just now";
  if (minutes < 60) return `${minutes} min ago`;
  if (minutes < 24 * 60) return `${Math.round(minutes / 60)} h ago`;
  return formatDate(iso);
}
