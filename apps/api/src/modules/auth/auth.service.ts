import type { Me, PasswordResetConfirmInput, SignInInput, SignUpInput } from '@keybed/shared';
import { AppError } from '../../http/errors';
import type { Mailer } from '../../lib/mail';
import { hashPassword, verifyAgainstDecoy, verifyPassword } from '../../lib/password';
import type { SessionStore } from '../../lib/sessions';
import { hashLinkToken, newLinkToken } from '../../lib/tokens';
import { isUniqueViolation } from '../../lib/pg-errors';
import type { AuthRepo } from './auth.repo';

const RESET_LIFETIME_MS = 60 * 60_000;

interface Deps {
  repo: AuthRepo;
  sessions: SessionStore;
  mailer: Mailer;
  appOrigin: string;
  now: () => Date;
}

const invalidCredentials = () => new AppError('invalid_credentials', 401, 'E-mail or password is not right');

export function createAuthService({ repo, sessions, mailer, appOrigin, now }: Deps) {
  async function startSession(userId: string, workshopId: string) {
    return sessions.start(userId, workshopId);
  }

  return {
    async signUp(input: SignUpInput) {
      const passwordHash = await hashPassword(input.password);
      try {
        const ids = await repo.transaction((tx) => repo.insertWorkshopWithOwner(tx, { ...input, passwordHash }));
        return startSession(ids.userId, ids.workshopId);
      } catch (err) {
        if (isUniqueViolation(err)) {
          throw new AppError('email_taken', 409, 'An account with this e-mail already exists', {
            email: ['An account with this e-mail already exists; sign in instead'],
          });
        }
        throw err;
      }
    },

    async signIn(input: SignInInput) {
      const user = await repo.findUserByEmail(input.email);
      const isValid = user ? await verifyPassword(user.passwordHash, input.password) : await verifyAgainstDecoy(input.password);
      if (!user || !isValid) throw invalidCredentials();
      const membership = await repo.findActiveMembershipForUser(user.id);
      if (!membership) throw invalidCredentials();
      return startSession(user.id, membership.workshopId);
    },

    async me(userId: string, workshopId: string): Promise<Me> {
      const me = await repo.findMe(userId, workshopId);
      if (!me) throw new AppError('unauthenticated', 401, 'Sign in to continue');
      return me;
    },

    async requestPasswordReset(email: string) {
      const user = await repo.findUserByEmail(email);
      if (!user) return;
      const { token, tokenHash } = newLinkToken();
      await repo.insertPasswordReset({ userId: user.id, tokenHash, expiresAt: new Date(now().getTime() + RESET_LIFETIME_MS) });
      const link = `${appOrigin}/reset-password/${token}`;
      await mailer.send({
        to: user.email,
        subject: 'Reset your Keybed password',
        text: `Hello ${user.name},\n\nSomeone asked to reset the password of your Keybed account. If it was you, open this link within an hour to choose a new one:\n\n${link}\n\nIf it was not you, ignore this e-mail: your password stays as it is.\n`,
      });
    },

    /** Sets the new password and ends every session of the account (old and stolen ones alike). */
    async confirmPasswordReset(input: PasswordResetConfirmInput) {
      const passwordHash = await hashPassword(input.password);
      const userId = await repo.transaction(async (tx) => {
        const reset = await repo.claimPasswordReset(tx, hashLinkToken(input.token), now());
        if (!reset) return undefined;
        await repo.setPassword(tx, reset.userId, passwordHash);
        return reset.userId;
      });
      if (!userId) {
        throw new AppError('token_invalid', 400, 'This reset link has expired or was already used. Ask for a new one.');
      }
      await sessions.endAllForUser(userId);
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
