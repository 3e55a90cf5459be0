import { describe, expect, it } from "vitest";
import { purgeConfirmed, trashNote } from "./trash";

describe("purge confirmation", () => {
  it("when the typed name equals the item's name, spaces around either aside, then the purge is confirmed", () => {
    expect(purgeConfirmed("Tank T-4", "Tank T-4")).toBe(true);
    expect(purgeConfirmed("  Tank T-4 ", "Tank T-4")).toBe(true);
    expect(purgeConfirmed("Tank T-4", "Tank T-4 ")).toBe(true);
  });

  it("when the typed name differs in case, inside spacing or a character, or is empty, then it is not confirmed", () => {
    expect(purgeConfirmed("tank t-4", "Tank T-4")).toBe(false);
    expect(purgeConfirmed("Tank  T-4", "Tank T-4")).toBe(false);
    expect(purgeConfirmed("Tank T-", "Tank T-4")).toBe(false);
    expect(purgeConfirmed("", "Tank T-4")).toBe(false);
  });
});

describe("trash notes", () => {
  const isoDate = (d: Date) => d.toISOString().slice(0, 10);
  const item = {
    deletedAt: "2026-11-20T09:00:00.000Z",
    purgeAt: "2026-12-20T09:00:00.000Z",
    deletedBy: { name: "Ines Okafor-Lund" },
  };

  it("when an item is in the trash, then the note says when and by whom it was deleted and when it goes for good", () => {
    expect(trashNote(item, isoDate)).toBe(
      "deleted 2026-11-20 by Ines Okafor-Lund · goes for good 2026-12-20",
    );
  });

  it("when the account that deleted it is gone, then the note says someone", () => {
    expect(trashNote({ ...item, deletedBy: null }, isoDate)).toBe(
      "deleted 2026-11-20 by someone · goes for good 2026-12-20",
    );
  });

  it("when no date writer is given, then the browser's local date is used", () => {
    const local = new Date(item.deletedAt).toLocaleDateString();
    expect(trashNote(item).startsWith(`deleted ${local} by`)).toBe(true);
  });
});
