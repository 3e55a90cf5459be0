import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { changePasswordHandler, getAccountHandler, updateAccountHandler } from "./handlers";
import { accountResponseSchema, changePasswordBodySchema, updateAccountBodySchema } from "./schema";

const tag = "account";

/** The signed-in person's own account under /api/account. */
export function accountRoutes(): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/account",
      tag,
      summary: "The signed-in account",
      access: { kind: "signed-in" },
      responses: { 200: { description: "The account.", schema: accountResponseSchema } },
      handler: getAccountHandler,
    }),
    defineRoute({
      method: "patch",
      path: "/account",
      tag,
      summary: "Change the account's name",
      access: { kind: "signed-in" },
      request: { body: updateAccountBodySchema },
      responses: { 200: { description: "The changed account.", schema: accountResponseSchema } },
      handler: updateAccountHandler,
    }),
    defineRoute({
      method: "post",
      path: "/account/password",
      tag,
      summary: "Change the password (needs the current one); other sessions end",
      access: { kind: "signed-in" },
      request: { body: changePasswordBodySchema },
      responses: { 204: { description: "Password changed; this session stays signed in." } },
      handler: changePasswordHandler,
    }),
  ];
}
