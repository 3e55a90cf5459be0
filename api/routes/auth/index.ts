import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import {
  forgotPasswordHandler,
  resetPasswordHandler,
  sessionHandler,
  signInHandler,
  signOutEverywhereHandler,
  signOutHandler,
  signUpHandler,
  verifyEmailHandler,
} from "./handlers";
import {
  forgotPasswordBodySchema,
  notice,
  resetPasswordBodySchema,
  sessionResponseSchema,
  signedInResponseSchema,
  signInBodySchema,
  signUpBodySchema,
  verifiedResponseSchema,
  verifyEmailBodySchema,
} from "./schema";

const tag = "auth";

/** Sign-up, sign-in, sign-out and password reset under /api/auth. */
export function authRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "post",
      path: "/auth/sign-up",
      tag,
      summary: "Create an account (confirmed by a mailed link, or at once from an invitation link)",
      description:
        "Without a matching invitation token the answer is the same 202 whether or not the address has an account: a new address is mailed a confirmation link, a known one a reminder.",
      access: { kind: "public" },
      rateLimit: "signUp",
      request: { body: signUpBodySchema },
      responses: {
        201: {
          description: "From an invitation link for this address: account created and signed in.",
          schema: signedInResponseSchema,
        },
        202: { description: "Check your mail (the same for known and unknown addresses).", schema: notice },
      },
      errors: { 409: "From an invitation link only: an account already uses this address." },
      handler: signUpHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/auth/verify-email",
      tag,
      summary: "Confirm the address with the token from the confirmation mail, and sign in",
      access: { kind: "public" },
      request: { body: verifyEmailBodySchema },
      responses: {
        200: {
          description: "Address confirmed and signed in; `next` is the page to go on to.",
          schema: verifiedResponseSchema,
        },
      },
      handler: verifyEmailHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/auth/sign-in",
      tag,
      summary: "Sign in (starts a new session with a new id)",
      description:
        "Unknown addresses and wrong passwords get the same 401. Failed attempts are limited per address and per account; correct ones do not count.",
      access: { kind: "public" },
      rateLimit: "signIn",
      request: { body: signInBodySchema },
      responses: {
        200: { description: "Signed in; the session cookie is set.", schema: signedInResponseSchema },
      },
      errors: { 401: "The address and password do not match an account." },
      handler: signInHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/auth/sign-out",
      tag,
      summary: "Sign out of this browser",
      access: { kind: "public" },
      responses: { 204: { description: "Signed out (also when already signed out)." } },
      handler: signOutHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/auth/sign-out-everywhere",
      tag,
      summary: "End every session of the signed-in account, on every device",
      access: { kind: "signed-in" },
      responses: { 204: { description: "All sessions ended." } },
      handler: signOutEverywhereHandler(context),
    }),
    defineRoute({
      method: "get",
      path: "/auth/session",
      tag,
      summary: "Who is signed in (user is null when nobody is)",
      access: { kind: "public" },
      responses: { 200: { description: "The session's user or null.", schema: sessionResponseSchema } },
      handler: sessionHandler,
    }),
    defineRoute({
      method: "post",
      path: "/auth/forgot-password",
      tag,
      summary: "Mail a single-use password-reset link (valid one hour)",
      description: "Answers the same whether or not an account uses the address.",
      access: { kind: "public" },
      rateLimit: "forgotPassword",
      request: { body: forgotPasswordBodySchema },
      responses: { 202: { description: "If the account exists, the mail is on its way.", schema: notice } },
      handler: forgotPasswordHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/auth/reset-password",
      tag,
      summary: "Set a new password with a reset link's token; ends every other session",
      access: { kind: "public" },
      request: { body: resetPasswordBodySchema },
      responses: { 200: { description: "Password changed and signed in.", schema: signedInResponseSchema } },
      handler: resetPasswordHandler(context),
    }),
  ];
}
