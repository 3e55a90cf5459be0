export { changePasswordBodySchema, updateAccountBodySchema } from "../../../core/contract/account";
export { signedInResponseSchema as accountResponseSchema } from "../../../core/contract/auth";
