import { describe, expect, it } from "vitest";
import { SHARE_LINK_MAX_DAYS, SHARE_LINK_STATES } from "../../../../../core/contract/share-links";
import {
  canRevokeShareLink,
  checkShareLinkForm,
  SHARE_LINK_FORM_DEFAULTS,
  SHARE_LINK_STATE_WORDS,
  shareLinkBody,
  shareLinkUses,
} from "./share-links";

// Product rules of the share-link form and table; the shared schema in core/contract judges the body.

const form = (over: Partial<typeof SHARE_LINK_FORM_DEFAULTS> = {}) => ({
  ...SHARE_LINK_FORM_DEFAULTS,
  ...over,
});

describe("the new-link body", () => {
  it("when the form is left as it opens, then a viewer link for 7 days with no use limit and no label is asked for", () => {
    expect(shareLinkBody(form())).toEqual({
      role: "viewer",
      label: undefined,
      expiresInDays: 7,
      maxUses: null,
    });
    expect(checkShareLinkForm(form())).toEqual({
      ok: true,
      body: { role: "viewer", label: undefined, expiresInDays: 7, maxUses: null },
    });
  });

  it("when a label and a use limit are typed, then both are sent, the limit as a number", () => {
    expect(shareLinkBody(form({ role: "editor", label: "Client review", maxUses: " 5 " }))).toEqual({
      role: "editor",
      label: "Client review",
      expiresInDays: 7,
      maxUses: 5,
    });
  });

  it("when the lifetime is left empty, then the form asks for a whole number instead of quietly using 7 days", () => {
    const checked = checkShareLinkForm(form({ expiresInDays: "  " }));
    expect(checked).toEqual({
      ok: false,
      errors: { expiresInDays: "Give the number of days as a whole number." },
    });
  });

  it("when the lifetime is over the longest allowed, then the form names that limit beside the field", () => {
    const checked = checkShareLinkForm(form({ expiresInDays: String(SHARE_LINK_MAX_DAYS + 1) }));
    expect(checked).toEqual({
      ok: false,
      errors: { expiresInDays: `A link lives at most ${SHARE_LINK_MAX_DAYS} days.` },
    });
  });

  it("when zero uses and a fractional lifetime are typed, then each field gets its own message", () => {
    const checked = checkShareLinkForm(form({ maxUses: "0", expiresInDays: "1.5" }));
    expect(checked.ok).toBe(false);
    if (!checked.ok) {
      expect(Object.keys(checked.errors).sort()).toEqual(["expiresInDays", "maxUses"]);
      expect(checked.errors.maxUses).toBe("Allow at least 1 use, or leave empty for no limit.");
    }
  });
});

describe("the links table", () => {
  it("when a link has a use limit, then uses read 'used / limit'; without one, the count alone", () => {
    expect(shareLinkUses({ useCount: 3, maxUses: 10 })).toBe("3 / 10");
    expect(shareLinkUses({ useCount: 0, maxUses: null })).toBe("0");
  });

  it("when a link is revoked, then it cannot be revoked again; every other state can be", () => {
    for (const state of SHARE_LINK_STATES) expect(canRevokeShareLink(state)).toBe(state !== "revoked");
  });

  it("when a state is shown, then it has a word and a mark of its own, not colour alone", () => {
    const marks = SHARE_LINK_STATES.map((s) => SHARE_LINK_STATE_WORDS[s].split(" ")[0]);
    expect(new Set(marks).size).toBe(SHARE_LINK_STATES.length);
    for (const s of SHARE_LINK_STATES) expect(SHARE_LINK_STATE_WORDS[s]).toContain(s.replace("_", " "));
  });
});
