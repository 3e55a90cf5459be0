import { describe, expect, it } from "vitest";
import { deleteConfirmed, membersWord, removeMemberQuestion, sectionRefusal, workspaceTabs } from "./roles";

// Product rules of the workspace pages (the API's role checks are tested in test/api); no outside source.

const tabs = (role: Parameters<typeof workspaceTabs>[0]) => workspaceTabs(role).map((t) => t.label);

describe("workspace tabs", () => {
  it("when the owner opens the workspace, then every tab shows, in the page's order", () => {
    expect(workspaceTabs("owner")).toEqual([
      { to: "projects", label: "Projects" },
      { to: "members", label: "Members" },
      { to: "invitations", label: "Invitations" },
      { to: "share-links", label: "Share links" },
      { to: "settings", label: "Settings" },
    ]);
  });

  it("when an editor opens it, then share links show but invitations and settings do not", () => {
    expect(tabs("editor")).toEqual(["Projects", "Members", "Share links"]);
  });

  it("when a reviewer or viewer opens it, then only projects and members show", () => {
    expect(tabs("reviewer")).toEqual(["Projects", "Members"]);
    expect(tabs("viewer")).toEqual(["Projects", "Members"]);
  });
});

describe("pages a role may open but not use", () => {
  it("when a reviewer or viewer opens invitations or share links, then the refusal names who may act", () => {
    for (const role of ["reviewer", "viewer"] as const) {
      expect(sectionRefusal(role, "invitations")).toMatch(/^Only owners invite people by e-mail\. You are a/);
      expect(sectionRefusal(role, "share-links")).toMatch(/^Only owners and editors create/);
      expect(sectionRefusal(role, "settings")).toMatch(new RegExp(`You are a ${role} here`));
    }
  });

  it("when an editor opens invitations, then it is refused but share links are not", () => {
    expect(sectionRefusal("editor", "invitations")).not.toBeNull();
    expect(sectionRefusal("editor", "share-links")).toBeNull();
    expect(sectionRefusal("owner", "invitations")).toBeNull();
  });
});

describe("member counts and questions", () => {
  it("when there is one member, then the word is singular; otherwise plural, zero too", () => {
    expect(membersWord(1)).toBe("member");
    expect(membersWord(0)).toBe("members");
    expect(membersWord(2)).toBe("members");
  });

  it("when the owner removes someone, then the question names the person and the workspace", () => {
    expect(removeMemberQuestion("Ines Okafor-Lund", "Quillon Engineering")).toBe(
      "Remove Ines Okafor-Lund from Quillon Engineering?",
    );
  });
});

describe("deleting a workspace", () => {
  it("when the name is typed exactly, then the delete is confirmed", () => {
    expect(deleteConfirmed("Quillon Engineering", "Quillon Engineering")).toBe(true);
  });

  it("when the typed name differs in case or by spaces around it, or is empty, then it is not", () => {
    expect(deleteConfirmed("quillon engineering", "Quillon Engineering")).toBe(false);
    expect(deleteConfirmed("Quillon Engineering ", "Quillon Engineering")).toBe(false);
    expect(deleteConfirmed("", "Quillon Engineering")).toBe(false);
  });
});
