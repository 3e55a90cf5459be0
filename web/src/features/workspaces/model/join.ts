/** Why an invitation or a share link cannot be used, by its state (active and pending need none). */
export const UNUSABLE: Readonly<Record<string, string>> = {
  accepted: "This invitation has been used already.",
  revoked: "This invitation was withdrawn.",
  expired: "This invitation has expired; ask the workspace's owner to send it again.",
  used_up: "This link has been used as many times as it allows.",
};

/** Why a share link in this state will not let a new member in, in words. */
export const shareLinkStateNote = (state: string): string => UNUSABLE[state] ?? `This link is ${state}.`;

/**
 * Sign-up and sign-in links that come back to `pathname` afterwards, with the invited address
 * filled in when there is one.
 */
export function signInLinks(pathname: string, email?: string): { signUp: string; signIn: string } {
  const next = encodeURIComponent(pathname);
  const mail = email ? `&email=${encodeURIComponent(email)}` : "";
  return { signUp: `/sign-up?next=${next}${mail}`, signIn: `/sign-in?next=${next}${mail}` };
}
