/**
 * The purge confirmation accepts the item's name as typed, ignoring spaces around either (a
 * project named "Tank " is confirmed by typing "Tank").
 */
export const purgeConfirmed = (typed: string, name: string): boolean => typed.trim() === name.trim();

/**
 * When a trashed item went and when it goes for good, and who deleted it ("someone" when that
 * account is gone). Dates are written by `formatDate` (the browser's locale on the page).
 */
export function trashNote(
  item: { deletedAt: string; purgeAt: string; deletedBy: { name: string } | null },
  formatDate: (date: Date) => string = (d) => d.toLocaleDateString(),
): string {
  return (
    `deleted ${formatDate(new Date(item.deletedAt))} by ${item.deletedBy?.name ?? "someone"} · ` +
    `goes for good ${formatDate(new Date(item.purgeAt))}`
  );
}
