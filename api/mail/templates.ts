import type { OutgoingMail } from "./mailer";

/** The product's name as every mail shows it. */
const PRODUCT = "Sigmacube";

const escapeHtml = (text: string) =>
  text.replace(
    /[&<>"']/g,
    (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!,
  );

/**
 * Lays out one message in both parts: a greeting, paragraphs, one link as a button (and
 * spelled out, for mail readers that hide buttons), and a closing note.
 */
function layout(options: {
  to: string;
  subject: string;
  greeting: string;
  paragraphs: string[];
  action: { label: string; url: string };
  footnote: string;
}): OutgoingMail {
  const { greeting, paragraphs, action, footnote } = options;
  const text = [
    greeting,
    "",
    ...paragraphs.flatMap((p) => [p, ""]),
    `${action.label}: ${action.url}`,
    "",
    footnote,
    "",
    `— ${PRODUCT}`,
  ].join("\n");
  const html = `<!doctype html>
<html lang="en"><body style="margin:0;background:#f5f1e8;font-family:'Source Sans 3',system-ui,sans-serif;color:#2a2c30">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:24px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" style="background:#fcfcfa;border:1px solid #d8d1c1">
<tr><td style="padding:16px 24px;border-bottom:1px solid #d8d1c1;font-size:20px;font-weight:600">Sigma<span style="color:#1d5a55">cube</span></td></tr>
<tr><td style="padding:24px;font-size:16px;line-height:1.5">
<p>${escapeHtml(greeting)}</p>
${paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("\n")}
<p style="margin:24px 0"><a href="${escapeHtml(action.url)}" style="background:#1d5a55;color:#fcfcfa;padding:10px 18px;text-decoration:none;font-weight:600">${escapeHtml(action.label)}</a></p>
<p style="font-size:14px;color:#5b5e66">Or paste this address into your browser:<br><a href="${escapeHtml(action.url)}" style="color:#1d5a55;word-break:break-all">${escapeHtml(action.url)}</a></p>
<p style="font-size:14px;color:#5b5e66">${escapeHtml(footnote)}</p>
</td></tr></table></td></tr></table></body></html>`;
  return { to: options.to, subject: options.subject, text, html };
}

/** The password-reset mail: a single-use link that expires in an hour. */
export function passwordResetMail(options: { to: string; name: string; url: string }): OutgoingMail {
  return layout({
    to: options.to,
    subject: `${PRODUCT}: reset your password`,
    greeting: `Hello ${options.name},`,
    paragraphs: [
      `Someone (hopefully you) asked to reset the password of your ${PRODUCT} account.`,
      "The link below works once and expires in one hour. Setting a new password signs you out everywhere else.",
    ],
    action: { label: "Choose a new password", url: options.url },
    footnote: "If you did not ask for this, ignore this mail: your password stays as it is.",
  });
}

/** The invitation mail: who invites, into which workspace, with which role. */
export function invitationMail(options: {
  to: string;
  inviterName: string;
  workspaceName: string;
  role: string;
  url: string;
  expiresAt: Date;
}): OutgoingMail {
  const expires = options.expiresAt.toISOString().slice(0, 10);
  return layout({
    to: options.to,
    subject: `${options.inviterName} invited you to ${options.workspaceName} on ${PRODUCT}`,
    greeting: "Hello,",
    paragraphs: [
      `${options.inviterName} invited you to join the workspace "${options.workspaceName}" on ${PRODUCT} as ${options.role}.`,
      `${PRODUCT} is where the team checks stress states and keeps the calculation record. Follow the link, sign in or create an account with this address, then choose “Accept” on the page that opens to join the workspace.`,
    ],
    action: { label: `Join ${options.workspaceName}`, url: options.url },
    footnote: `The invitation expires on ${expires} (UTC). If you were not expecting it, ignore this mail.`,
  });
}

/** The confirmation mail after sign-up: opening the link proves the address and signs in. */
export function emailVerificationMail(options: {
  to: string;
  name: string;
  url: string;
  lifetimeHours: number;
}): OutgoingMail {
  return layout({
    to: options.to,
    subject: `${PRODUCT}: confirm your e-mail address`,
    greeting: `Hello ${options.name},`,
    paragraphs: [
      `Confirm that this address is yours to finish setting up your ${PRODUCT} account. Invitations to a team's workspace can be accepted only from a confirmed address.`,
      `The link below works once and expires in ${options.lifetimeHours} hours.`,
    ],
    action: { label: "Confirm my address", url: options.url },
    footnote: "If you did not create an account, ignore this mail: nothing happens without the link.",
  });
}

/**
 * What a sign-up for an address that has an account sends instead of an error, so the
 * sign-up form does not tell a stranger which addresses have accounts.
 */
export function accountExistsMail(options: {
  to: string;
  name: string;
  signInUrl: string;
  resetUrl: string;
}): OutgoingMail {
  return layout({
    to: options.to,
    subject: `${PRODUCT}: you already have an account`,
    greeting: `Hello ${options.name},`,
    paragraphs: [
      `Someone (hopefully you) tried to create a ${PRODUCT} account with this address, which has an account already. No second account was made.`,
      `Sign in with the link below. If you do not remember the password, choose a new one here: ${options.resetUrl}`,
    ],
    action: { label: "Sign in", url: options.signInUrl },
    footnote: "If this was not you, ignore this mail: your account stays as it is.",
  });
}

/** What a review mail says about the record it concerns. */
type RecordMailFacts = {
  to: string;
  name: string;
  projectName: string;
  recordNumber: number;
  revision: string;
  url: string;
};

const recordLabel = (facts: RecordMailFacts) => `record ${facts.recordNumber}, revision ${facts.revision}`;

/** To each reviewer and owner: a record waits for their check. */
export function recordSubmittedMail(
  facts: RecordMailFacts & { submitterName: string; reason: string },
): OutgoingMail {
  return layout({
    to: facts.to,
    subject: `${facts.projectName}: ${recordLabel(facts)} is submitted for check`,
    greeting: `Hello ${facts.name},`,
    paragraphs: [
      `${facts.submitterName} submitted the calculation of "${facts.projectName}" for check as ${recordLabel(facts)}.`,
      `What changed and why: ${facts.reason}`,
      "Open the project to read the frozen record, comment on it, and return it with comments or approve it. Someone who submitted a record or last edited its inputs cannot approve it.",
    ],
    action: { label: "Open the project", url: facts.url },
    footnote: `You receive this because you are a reviewer or owner of the workspace that holds "${facts.projectName}".`,
  });
}

/** To the submitter: their record came back with comments. */
export function recordReturnedMail(
  facts: RecordMailFacts & { checkerName: string; comment: string },
): OutgoingMail {
  return layout({
    to: facts.to,
    subject: `${facts.projectName}: ${recordLabel(facts)} was returned with comments`,
    greeting: `Hello ${facts.name},`,
    paragraphs: [
      `${facts.checkerName} returned ${recordLabel(facts)} of "${facts.projectName}" with comments.`,
      `Their comment: ${facts.comment}`,
      "Open the project to read and answer the comments, change what is needed and submit it again.",
    ],
    action: { label: "Open the project", url: facts.url },
    footnote: "You receive this because you submitted the record.",
  });
}

/** To the submitter: their record has every approval it needs. */
export function recordApprovedMail(facts: RecordMailFacts & { approverNames: string[] }): OutgoingMail {
  return layout({
    to: facts.to,
    subject: `${facts.projectName}: ${recordLabel(facts)} is approved`,
    greeting: `Hello ${facts.name},`,
    paragraphs: [
      `${recordLabel(facts)[0].toUpperCase()}${recordLabel(facts).slice(1)} of "${facts.projectName}" is approved by ${facts.approverNames.join(" and ")}.`,
      "The approved record stays as it was submitted. A later change to the project is checked as the next revision.",
    ],
    action: { label: "Open the project", url: facts.url },
    footnote: "You receive this because you submitted the record.",
  });
}
