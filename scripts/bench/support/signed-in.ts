/**
 * A signed-in bench user with a workspace of their own on a throwaway server: signs up, confirms
 * the address through the development mailbox (the throwaway server has no SMTP_URL) and creates a
 * workspace. The load and report benches share it.
 */

/** The token of the confirmation link mailed to `email`, from the development mailbox. */
async function confirmationToken(origin: string, email: string): Promise<string> {
  for (let attempt = 0; attempt < 50; attempt++) {
    const list = (await (
      await fetch(`${origin}/api/dev/mailbox?to=${encodeURIComponent(email)}`)
    ).json()) as {
      messages: { id: string; subject: string }[];
    };
    const mail = list.messages.find((m) => /confirm your e-mail address/.test(m.subject));
    if (mail) {
      const { text } = (await (await fetch(`${origin}/api/dev/mailbox/${mail.id}`)).json()) as {
        text: string;
      };
      const link = text.match(/https?:\/\/\S+\/verify-email\/(\S+)/);
      if (link) return link[1];
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no confirmation mail for ${email}`);
}

/** Signs a bench user up and in; returns the session cookie, the user id and a new workspace id. */
export async function signedIn(origin: string) {
  const signUp = await fetch(`${origin}/api/auth/sign-up`, {
    method: "POST",
    headers: { "content-type": "application/json", origin },
    body: JSON.stringify({ name: "Bench", email: "bench@example.test", password: "correct horse battery" }),
  });
  if (signUp.status !== 202) throw new Error(`sign-up answered ${signUp.status}`);
  // Sign-up answers the same for every address and signs no one in: confirm through the mailed
  // link, read from the development mailbox (this throwaway server has no SMTP_URL).
  const token = await confirmationToken(origin, "bench@example.test");
  const confirmed = await fetch(`${origin}/api/auth/verify-email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin },
    body: JSON.stringify({ token }),
  });
  if (confirmed.status !== 200) throw new Error(`confirming the address answered ${confirmed.status}`);
  const cookie = confirmed.headers.getSetCookie()[0].split(";")[0];
  const userId = ((await confirmed.json()) as { user: { id: string } }).user.id;
  const created = await fetch(`${origin}/api/workspaces`, {
    method: "POST",
    headers: { "content-type": "application/json", origin, cookie },
    body: JSON.stringify({ name: "Bench" }),
  });
  const workspaceId = ((await created.json()) as { workspace: { id: string } }).workspace.id;
  return { cookie, userId, workspaceId };
}
