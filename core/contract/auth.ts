import { z } from "zod";

/**
 * Sign-up, sign-in and password reset. Shared by the API (which validates) and the web
 * forms (which show the same messages beside each field): imports only zod.
 */

/** Shortest password accepted; long passphrases beat clever rules (NIST SP 800-63B §5.1.1). */
export const PASSWORD_MIN_LENGTH = 10;
/** Longest password accepted: argon2 hashes anything, but a cap stops megabyte bodies being hashed. */
export const PASSWORD_MAX_LENGTH = 200;

// The HTML Standard's "valid e-mail address" (what <input type=email> accepts), with a dot in
// the domain: loose enough for real addresses, strict enough that the mail transport can send
// to it (quotes, brackets or "_" in the domain used to pass here and fail there with a 502).
const EMAIL_PATTERN =
  /^[a-zA-Z0-9.!#$%&'*+/=?^_`{|}~-]+@[a-zA-Z0-9](?:[a-zA-Z0-9-]{0,61}[a-zA-Z0-9])?(?:\.[a-zA-Z0-9](?:[a-zA-Z0-9-]{0,61}[a-zA-Z0-9])?)+$/;

/** An e-mail address as typed: trimmed; compared case-insensitively by the server. */
export const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "An e-mail address has at most 254 characters.")
  .regex(EMAIL_PATTERN, "Enter an e-mail address like name@example.com.");

/** A new password: only a length rule, said plainly. */
export const newPasswordSchema = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`);

/** A person's name as shown to their team. */
export const personNameSchema = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, "Enter your name.")
  .max(100, "A name has at most 100 characters.");

/** A secret token from a link in an e-mail (base64url). */
export const linkTokenSchema = z
  .string({ error: "The link is incomplete." })
  .regex(/^[A-Za-z0-9_-]{20,100}$/, "This link is not complete; open it again from the e-mail.");

/** A page of this app to go on to afterwards (a path, never another site). */
export const nextPathSchema = z
  .string()
  .max(500, "A page address has at most 500 characters.")
  .regex(/^\/(?![/\\])[^\s\\]*$/, "Give a page of this app, starting with a single /.");

export const signUpBodySchema = z.object({
  name: personNameSchema,
  email: emailSchema,
  password: newPasswordSchema,
  /** The token of the invitation link the person came from: it proves the address, so the account starts signed in. */
  invitationToken: linkTokenSchema.optional(),
  /** Where the confirmation link leads after confirming (e.g. back to an invitation). */
  next: nextPathSchema.optional(),
});
export type SignUpBody = z.infer<typeof signUpBodySchema>;

export const signInBodySchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: "Enter your password." })
    .min(1, "Enter your password.")
    .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`),
});
export type SignInBody = z.infer<typeof signInBodySchema>;

export const forgotPasswordBodySchema = z.object({ email: emailSchema });
export type ForgotPasswordBody = z.infer<typeof forgotPasswordBodySchema>;

/** `POST /api/auth/verify-email`: the token from the confirmation mail. */
export const verifyEmailBodySchema = z.object({ token: linkTokenSchema });
export type VerifyEmailBody = z.infer<typeof verifyEmailBodySchema>;

export const resetPasswordBodySchema = z.object({
  token: linkTokenSchema,
  password: newPasswordSchema,
});
export type ResetPasswordBody = z.infer<typeof resetPasswordBodySchema>;

/** The signed-in person, as the API shows them to themselves. */
export const userSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  email: z.string(),
  createdAt: z.iso.datetime(),
});
export type User = z.infer<typeof userSchema>;

/** `GET /api/auth/session`: who is signed in, or null. */
export const sessionResponseSchema = z.object({ user: userSchema.nullable() });
export type SessionResponse = z.infer<typeof sessionResponseSchema>;

/** `POST /api/auth/sign-in`, `/sign-up`, `/reset-password`. */
export const signedInResponseSchema = z.object({ user: userSchema });

/** An answer that only says what happens next (forgot password, sign-up without an invitation). */
export const notice = z.object({ message: z.string() });
export type Notice = z.infer<typeof notice>;

/**
 * `POST /api/auth/sign-up`: signed in straight away (201) when an invitation link proved
 * the address; otherwise (202) only "check your mail", the same whether or not the address
 * has an account.
 */
export const signUpResponseSchema = z.union([signedInResponseSchema, notice]);
export type SignUpResponse = z.infer<typeof signUpResponseSchema>;

/** `POST /api/auth/verify-email`: signed in, and the page the person was on their way to. */
export const verifiedResponseSchema = z.object({ user: userSchema, next: z.string().nullable() });
