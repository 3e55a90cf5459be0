import type { Transaction } from "sequelize";
import { EmailVerificationToken } from "../../db/models/email-verification-token";
import type { User } from "../../db/models/user";
import type { AppContext } from "../context";
import { emailVerificationMail } from "../mail/templates";
import { hashToken, newLinkToken } from "./tokens";

/** How long a confirmation link works. */
export const VERIFY_LINK_LIFETIME_HOURS = 48;

/**
 * Issues a confirmation link for `user`'s address (only the newest works: earlier unused
 * ones are retired) and mails it. `nextPath` is where the link leads after confirming.
 */
export async function sendVerificationMail(
  context: AppContext,
  user: Pick<User, "id" | "email" | "name">,
  nextPath: string | null,
): Promise<void> {
  const token = newLinkToken();
  await context.sequelize.transaction(async (transaction) => {
    await EmailVerificationToken.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    await EmailVerificationToken.create(
      {
        userId: user.id,
        tokenHash: hashToken(token),
        nextPath,
        expiresAt: new Date(Date.now() + VERIFY_LINK_LIFETIME_HOURS * 3_600_000),
      },
      { transaction },
    );
  });
  await context.mailer.send(
    emailVerificationMail({
      to: user.email,
      name: user.name,
      url: `${context.publicOrigin}/verify-email/${token}`,
      lifetimeHours: VERIFY_LINK_LIFETIME_HOURS,
    }),
  );
}

/** Records that a link mailed to the address proved it (the first proof counts; later ones change nothing). */
export async function markEmailVerified(user: User, transaction?: Transaction): Promise<void> {
  if (!user.emailVerifiedAt) await user.update({ emailVerifiedAt: new Date() }, { transaction });
}
