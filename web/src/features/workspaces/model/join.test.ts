import { describe, expect, it } from "vitest";
import { INVITATION_STATES } from "../../../../../core/contract/invitations";
import { ApiError } from "../../../lib/api-client";
import { isNotFound, isNotThere } from "./errors";
import { shareLinkStateNote, signInLinks, UNUSABLE } from "./join";

describe("sign-in links from a join page", () => {
  it("when an invitation names an address, then both links come back to the page and fill in the address, encoded", () => {
    expect(signInLinks("/invitations/abc_DEF-1", "ines+site@quillon.example")).toEqual({
      signUp: "/sign-up?next=%2Finvitations%2Fabc_DEF-1&email=ines%2Bsite%40quillon.example",
      signIn: "/sign-in?next=%2Finvitations%2Fabc_DEF-1&email=ines%2Bsite%40quillon.example",
    });
  });

  it("when no address is known (a share link), then the links only come back to the page", () => {
    const links = signInLinks("/join/tok");
    expect(links).toEqual({ signUp: "/sign-up?next=%2Fjoin%2Ftok", signIn: "/sign-in?next=%2Fjoin%2Ftok" });
    expect(new URLSearchParams(links.signIn.split("?")[1]).get("next")).toBe("/join/tok");
  });
});

describe("unusable invitations and links", () => {
  it("when an invitation is anything but pending, then a sentence says why it cannot be used", () => {
    for (const state of INVITATION_STATES.filter((s) => s !== "pending")) {
      expect(UNUSABLE[state]).toMatch(/^This invitation /);
    }
    expect(UNUSABLE.pending).toBeUndefined();
  });

  it("when a share link is used up, then its note says so; a state with no sentence is named as it is", () => {
    expect(shareLinkStateNote("used_up")).toBe("This link has been used as many times as it allows.");
    expect(shareLinkStateNote("paused")).toBe("This link is paused.");
  });
});

describe("pages with nothing to show", () => {
  it("when the server answers 400 or 404, then the workspace is not there for this user; other errors are shown as they are", () => {
    expect(isNotThere(new ApiError(404, "not_found", "x"))).toBe(true);
    expect(isNotThere(new ApiError(400, "invalid_input", "x"))).toBe(true);
    expect(isNotThere(new ApiError(500, "internal", "x"))).toBe(false);
    expect(isNotThere(new Error("x"))).toBe(false);
  });

  it("when an invitation link answers 404, then it is not found; a 400 is another error", () => {
    expect(isNotFound(new ApiError(404, "not_found", "x"))).toBe(true);
    expect(isNotFound(new ApiError(400, "invalid_input", "x"))).toBe(false);
  });
});
