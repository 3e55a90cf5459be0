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
} from "./handlers";
import {
  forgotPasswordBodySchema,
  notice,
  resetPasswordBodySchema,
  sessionResponseSchema,
  signedInResponseSchema,
  signInBodySchema,
  signUpBodySchema,
} from "./schema";

const tag = "auth";

/** Sign-up, sign-in, sign-out and password reset under /api/auth. */
export function authRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "post",
      path: "/auth/sign-up",
      tag,
      summary: "Create an account and sign in",
      access: { kind: "public" },
      rateLimit: "signUp",
      request: { body: signUpBodySchema },
      responses: {
        201: { description: "Account created; the session cookie is set.", schema: signedInResponseSchema },
      },
      errors: { 409: "An account already uses this address." },
      handler: signUpHandler(context),
    }),
    defineRoute({
      method: "post",
      path: "/auth/sign-in",
      tag,
      summary: "Sign in (starts a new session with a new id)",
      description: "Unknown addresses and wrong passwords get the same 401.",
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
