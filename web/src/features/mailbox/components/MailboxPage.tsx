import { Link, useParams } from "react-router-dom";
import { ApiError } from "../../../lib/api-client";
import { useMail } from "../api/get-mail";
import { useMailbox } from "../api/list-mail";

/** `/dev/mailbox[/:messageId]`: mail caught by the fake SMTP server, when no real mail server is set. */
export function MailboxPage() {
  const { messageId } = useParams();
  const mailbox = useMailbox();
  const message = useMail(messageId);
  if (mailbox.error instanceof ApiError && mailbox.error.status === 404) {
    return (
      <section className="mx-auto max-w-xl py-12 text-center">
        <h1 className="text-2xl font-semibold">No development mailbox</h1>
        <p className="mt-2 text-graphite-soft">
          This server sends real mail (SMTP_URL is set), so there is nothing to show here.
        </p>
      </section>
    );
  }
  return (
    <div className="space-y-4">
      <p role="note" className="rounded border border-close bg-close-wash px-4 py-3 text-graphite">
        <span aria-hidden="true">⚠ </span>
        <strong>Mail is not really being sent.</strong> No SMTP_URL is configured, so every message stays on
        this server and is shown here instead.
      </p>
      <h1 className="text-2xl font-semibold tracking-tight">Development mailbox</h1>
      <div className="grid gap-4 md:grid-cols-[22rem_1fr]">
        <ul aria-label="Messages" className="divide-y divide-rule rounded border border-rule bg-panel">
          {mailbox.data?.messages.length === 0 && (
            <li className="px-4 py-3 text-graphite-soft">No mail yet.</li>
          )}
          {mailbox.data?.messages.map((m) => (
            <li key={m.id}>
              <Link
                to={`/dev/mailbox/${m.id}`}
                aria-current={m.id === messageId ? "page" : undefined}
                className={`block px-4 py-3 ${m.id === messageId ? "bg-ink-wash" : "hover:bg-paper"}`}
              >
                <span className="block font-semibold text-graphite">{m.subject}</span>
                <span className="block text-sm text-graphite-soft">
                  to {m.to.join(", ")} ·{" "}
                  <span className="num">{new Date(m.receivedAt).toLocaleString()}</span>
                </span>
              </Link>
            </li>
          ))}
        </ul>
        <article className="rounded border border-rule bg-panel p-4">
          {!messageId && <p className="text-graphite-soft">Choose a message to read it.</p>}
          {message.data && (
            <div className="space-y-3">
              <h2 className="text-lg font-semibold">{message.data.subject}</h2>
              <p className="text-sm text-graphite-soft">
                From {message.data.from} to {message.data.to.join(", ")}
              </p>
              {message.data.html && (
                // Sandboxed: the mail's HTML cannot run scripts; links open in a new tab.
                <iframe
                  title="HTML part"
                  sandbox="allow-popups allow-popups-to-escape-sandbox allow-top-navigation-by-user-activation"
                  srcDoc={message.data.html.replace("<head>", '<head><base target="_top">')}
                  className="h-[28rem] w-full rounded border border-rule"
                />
              )}
              <details>
                <summary className="cursor-pointer text-sm font-semibold">Plain-text part</summary>
                <pre className="mt-2 whitespace-pre-wrap rounded bg-paper p-3 text-sm">
                  {message.data.text}
                </pre>
              </details>
            </div>
          )}
        </article>
      </div>
    </div>
  );
}

/** A header link to the mailbox, only while the server has one. */
export function MailboxLink() {
  const mailbox = useMailbox();
  if (!mailbox.data) return null;
  return (
    <Link to="/dev/mailbox" className="text-sm text-graphite-soft hover:text-ink">
      Dev mailbox <span className="num">({mailbox.data.messages.length})</span>
    </Link>
  );
}
