import { describe, expect, it } from "vitest";
import { INVITATION_STATES } from "../../../../../core/contract/invitations";
import { ApiError } from "../../../lib/api-client";
import {
  canResendOrRevoke,
  INVITATION_STATE_WORDS,
  invitationErrorAboveTable,
  isAlreadyInvited,
} from "./invitations";

describe("invitation actions", () => {
  it("when an invitation is pending or expired, then it can be resent or withdrawn; accepted or revoked ones cannot", () => {
    expect(INVITATION_STATES.filter(canResendOrRevoke)).toEqual(["pending", "expired"]);
  });

  it("when a state is shown, then it has a word and a mark of its own, not colour alone", () => {
    const marks = INVITATION_STATES.map((s) => INVITATION_STATE_WORDS[s].split(" ")[0]);
    expect(new Set(marks).size).toBe(INVITATION_STATES.length);
    for (const s of INVITATION_STATES) expect(INVITATION_STATE_WORDS[s]).toContain(s);
  });
});

describe("inviting errors", () => {
  const conflict = new ApiError(409, "already_member", "That address is already a member.");
  const invalid = new ApiError(400, "invalid_input", "check the fields", []);
  const forbidden = new ApiError(403, "forbidden", "Owners only.");

  it("when the address is already a member or invited (409), then it belongs beside the e-mail field", () => {
    expect(isAlreadyInvited(conflict)).toBe(true);
    expect(isAlreadyInvited(invalid)).toBe(false);
    expect(isAlreadyInvited(new Error("409"))).toBe(false);
  });

  it("when the server refuses for another reason, then that error is shown above the table; 400 and 409 are not", () => {
    expect(invitationErrorAboveTable(forbidden)).toBe(forbidden);
    expect(invitationErrorAboveTable(conflict)).toBeNull();
    expect(invitationErrorAboveTable(invalid)).toBeNull();
  });

  it("when there is no error, or it is not the server's answer, then nothing is shown above the table", () => {
    expect(invitationErrorAboveTable(null)).toBeNull();
    expect(invitationErrorAboveTable(new Error("Failed to fetch"))).toBeNull();
  });
});
