export {
  forgotPasswordBodySchema,
  notice,
  resetPasswordBodySchema,
  sessionResponseSchema,
  signedInResponseSchema,
  signInBodySchema,
  signUpBodySchema,
  verifiedResponseSchema,
  verifyEmailBodySchema,
} from "../../../core/contract/auth";

/** How long a password-reset link works. */
export const RESET_LINK_LIFETIME_MS = 60 * 60 * 1000;

/** The same answer whether or not the address has an account (no enumeration). */
export const FORGOT_PASSWORD_NOTICE =
  "If an account uses that address, a link to choose a new password is on its way. It works once, for one hour.";

/** The same answer whether or not the address has an account (no enumeration). */
export const SIGN_UP_NOTICE = "We have sent a message to that address. Follow the link in it to go on.";
