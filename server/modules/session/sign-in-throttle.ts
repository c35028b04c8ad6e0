import type { Sequelize } from 'sequelize';
import { AppError } from '../../lib/errors';

export interface SignInLimits {
  /** Failures allowed per account (the typed e-mail) per window: one person's typos lock only that account. */
  perAccount: number;
  /** Failures allowed per client address per window: a plant behind one NAT address has room, a guessing run does not. */
  perAddress: number;
  windowMs: number;
}

const accountKey = (email: string) => email.trim().toLowerCase().slice(0, 320);
const addressKey = (ip: string | undefined) => (ip ?? 'unknown').slice(0, 100);

/** Counts failed sign-ins in PostgreSQL, so two server instances share them. */
export function signInThrottle(sequelize: Sequelize, limits: SignInLimits) {
  const minutes = Math.ceil(limits.windowMs / 60_000);
  const seconds = limits.windowMs / 1000;

  return {
    /** Refuses (429) before the password is checked when either count is used up. */
    async check(email: string, ip: string | undefined): Promise<void> {
      const [rows] = await sequelize.query(
        `SELECT count(*) FILTER (WHERE account = :account)::int AS by_account, count(*) FILTER (WHERE address = :address)::int AS by_address
           FROM sign_in_failures
          WHERE failed_at > now() - make_interval(secs => :seconds) AND (account = :account OR address = :address)`,
        { replacements: { account: accountKey(email), address: addressKey(ip), seconds } },
      );
      const { by_account: byAccount, by_address: byAddress } = (rows as { by_account: number; by_address: number }[])[0]!;
      if (byAccount >= limits.perAccount) {
        throw new AppError(429, 'too_many_attempts', `Too many failed sign-ins for this account. Wait ${minutes} minutes, or ask your administrator to reset your password.`);
      }
      if (byAddress >= limits.perAddress) {
        throw new AppError(429, 'too_many_attempts', `Too many failed sign-ins from this network. Wait ${minutes} minutes and try again.`);
      }
    },

    async recordFailure(email: string, ip: string | undefined): Promise<void> {
      await sequelize.query(
        `DELETE FROM sign_in_failures WHERE failed_at <= now() - make_interval(secs => :seconds);
         INSERT INTO sign_in_failures (account, address) VALUES (:account, :address);`,
        { replacements: { account: accountKey(email), address: addressKey(ip), seconds } },
      );
    },

    /** A right password ends the account's count (the address's count stays). */
    async recordSuccess(email: string): Promise<void> {
      await sequelize.query('DELETE FROM sign_in_failures WHERE account = :account', { replacements: { account: accountKey(email) } });
    },
  };
}
