import {
  PIN_FAILURES_BEFORE_LOCK,
  PIN_LOCK_MINUTES,
  WALL_GRANT_HOURS,
  WALL_GRANT_WINDOW_MINUTES,
  type BenchTechnician,
  type PinStatus,
  type SetMemberPinInput,
  type SetOwnPinInput,
  type WallClockGrant,
} from '@keybed/shared';
import type { AuthContext, WallContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import type { Logger } from '../../lib/logger';
import { hashPassword, verifyPassword } from '../../lib/password';
import { hashLinkToken, newLinkToken } from '../../lib/tokens';
import type { Tx } from '../auth/auth.repo';
import type { PinMember, PinsRepo } from './pins.repo';

interface Deps {
  repo: PinsRepo;
  logger: Logger;
  now: () => Date;
  /** Wrong PINs one wall screen may send in an hour. */
  devicePerHour: number;
}

const HOUR_MS = 3600_000;
const LOCK_MS = PIN_LOCK_MINUTES * 60_000;
const GRANT_MS = WALL_GRANT_HOURS * HOUR_MS;
const GRANT_WINDOW_MS = WALL_GRANT_WINDOW_MINUTES * 60_000;
const minutesUntil = (until: Date, now: Date) => Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 60_000));
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

const lockedError = (name: string, until: Date, now: Date) => {
  const minutes = minutesUntil(until, now);
  return new AppError(
    'pin_locked',
    429,
    `${name} is locked for ${plural(minutes, 'minute')} after ${PIN_FAILURES_BEFORE_LOCK} wrong PINs. An owner or foreman can unlock sooner.`,
    undefined,
    { lockedUntil: until.toISOString(), lockedMinutes: minutes },
  );
};

/** What a PIN check at the wall came to; failures are written to the database before they are thrown. */
type Outcome = { member: PinMember; grant?: WallClockGrant } | { error: AppError; log?: { msg: string; membershipId?: string; failedCount?: number } };

/** Why a clock grant was refused: the words the screen shows, and a reason for the log (never the token). */
const grantRefused = (message: string, fields?: Record<string, string[]>) => new AppError('grant_refused', 403, message, fields);
const NOT_THIS_GRANT = 'This grant is not valid for this screen and technician. Enter the PIN to send the action.';

const toStatus = (m: PinMember, now: Date): PinStatus => ({
  hasPin: m.pinHash !== null,
  lockedUntil: m.pinLockedUntil && m.pinLockedUntil > now ? m.pinLockedUntil.toISOString() : null,
  failedAttempts: m.pinFailedCount,
});

/**
 * Technicians' wall-screen PINs: six digits, stored as argon2id hashes, never logged. Five wrong
 * PINs in a row lock that technician for five minutes (counted in the database, so restarts and
 * several API processes share the count); each screen may send a capped number of wrong PINs an
 * hour. Every failure and lock becomes a security event and a log line without the PIN.
 */
export function createPinsService({ repo, logger, now, devicePerHour }: Deps) {
  /** The device's hourly cap; reaching it records one `wall_pin_limit` event. */
  async function checkDeviceCap(tx: Parameters<Parameters<PinsRepo['transaction']>[0]>[0], wall: WallContext, at: Date): Promise<AppError | null> {
    await repo.lockDevice(tx, wall.deviceId);
    const { count, oldest } = await repo.deviceFailuresSince(tx, wall.deviceId, new Date(at.getTime() - HOUR_MS));
    if (count < devicePerHour) return null;
    const minutes = oldest ? minutesUntil(new Date(oldest.getTime() + HOUR_MS), at) : 60;
    return new AppError('wall_pin_limit', 429, `Too many wrong PINs on this screen in the last hour. Try again in ${plural(minutes, 'minute')}, or ask an owner or foreman.`);
  }

  /**
   * Checks the PIN in one transaction under the member's row lock; with `withGrant`, a right PIN
   * also stores a clock grant for this screen and technician in that transaction, so a PIN change
   * or lock committed meanwhile (which deletes grants under the same lock) cannot be outrun.
   */
  async function verify(wall: WallContext, technicianId: string, pin: string, withGrant = false): Promise<Outcome> {
    return repo.transaction(async (tx): Promise<Outcome> => {
      const at = now();
      const capped = await checkDeviceCap(tx, wall, at);
      if (capped) return { error: capped, log: { msg: 'wall screen refused: hourly cap of wrong PINs reached' } };
      const member = await repo.memberByUser(wall.workshopId, technicianId, tx);
      if (!member?.isActive) return { error: notFound('That technician') };
      if (!member.pinHash) {
        return { error: new AppError('pin_not_set', 409, `${member.name} has no PIN yet. Set one on your profile, or ask the owner.`) };
      }
      if (member.pinLockedUntil && member.pinLockedUntil > at) return { error: lockedError(member.name, member.pinLockedUntil, at) };
      if (await verifyPassword(member.pinHash, pin)) {
        if (member.pinFailedCount > 0 || member.pinLockedUntil) await repo.setFailures(tx, member.membershipId, 0, null);
        if (!withGrant) return { member };
        const { token, tokenHash } = newLinkToken();
        const expiresAt = new Date(at.getTime() + GRANT_MS);
        await repo.insertGrant(tx, { workshopId: wall.workshopId, deviceId: wall.deviceId, technicianId: member.userId, tokenHash, issuedAt: at, expiresAt });
        return { member, grant: { token, issuedAt: at.toISOString(), expiresAt: expiresAt.toISOString() } };
      }
      const failed = member.pinFailedCount + 1;
      const event = { workshopId: wall.workshopId, membershipId: member.membershipId, deviceId: wall.deviceId, at };
      await repo.recordEvent(tx, { ...event, kind: 'pin_failed', detail: { failedInARow: failed } });
      const { count } = await repo.deviceFailuresSince(tx, wall.deviceId, new Date(at.getTime() - HOUR_MS));
      if (count === devicePerHour) await repo.recordEvent(tx, { ...event, membershipId: null, kind: 'wall_pin_limit', detail: { failuresInHour: count } });
      if (failed >= PIN_FAILURES_BEFORE_LOCK) {
        const until = new Date(at.getTime() + LOCK_MS);
        await repo.setFailures(tx, member.membershipId, 0, until);
        await repo.deleteGrants(tx, wall.workshopId, member.userId);
        await repo.recordEvent(tx, { ...event, kind: 'pin_locked', detail: { minutes: PIN_LOCK_MINUTES } });
        return { error: lockedError(member.name, until, at), log: { msg: 'technician PIN locked after wrong PINs', membershipId: member.membershipId, failedCount: failed } };
      }
      await repo.setFailures(tx, member.membershipId, failed, null);
      const left = PIN_FAILURES_BEFORE_LOCK - failed;
      return {
        error: new AppError('pin_incorrect', 403, `Wrong PIN. ${left} more ${left === 1 ? 'try' : 'tries'} before a ${PIN_LOCK_MINUTES}-minute lock.`, { pin: ['Wrong PIN'] }, { triesLeft: left }),
        log: { msg: 'wrong wall PIN', membershipId: member.membershipId, failedCount: failed },
      };
    });
  }

  async function setPin(workshopId: string, target: PinMember, pin: string, actorUserId: string) {
    const pinHash = await hashPassword(pin);
    await repo.transaction(async (tx) => {
      const at = now();
      await repo.setPin(tx, target.membershipId, pinHash, at);
      await repo.deleteGrants(tx, workshopId, target.userId);
      await repo.recordEvent(tx, { workshopId, membershipId: target.membershipId, actorUserId, kind: 'pin_set', at });
    });
  }

  function settled(wall: WallContext, outcome: Outcome) {
    if ('member' in outcome) return outcome;
    if (outcome.log) {
      const { msg, ...fields } = outcome.log;
      logger.warn({ workshopId: wall.workshopId, deviceId: wall.deviceId, ...fields }, msg);
    }
    throw outcome.error;
  }

  return {
    /** Checks the technician's PIN at a wall screen; answers the member, or throws after recording the failure. */
    async verifyAtWall(wall: WallContext, technicianId: string, pin: string): Promise<PinMember> {
      return settled(wall, await verify(wall, technicianId, pin)).member;
    },

    /** Checks the PIN like `verifyAtWall`; a right one also answers a new clock grant for this screen. */
    async grantAtWall(wall: WallContext, technicianId: string, pin: string): Promise<{ member: PinMember; grant: WallClockGrant }> {
      const { member, grant } = settled(wall, await verify(wall, technicianId, pin, true));
      return { member, grant: grant! };
    },

    /**
     * Accepts a clock grant for an action at `at` (now when absent), inside the action's own
     * transaction after the technician's row is locked; throws `grant_refused` otherwise. A grant
     * serves only the screen and technician it was given to, until it expires, while the screen is
     * paired, and only for an action made within WALL_GRANT_WINDOW_MINUTES of its PIN check.
     */
    async checkGrant(tx: Tx, wall: WallContext, technicianId: string, token: string, at: string | undefined) {
      const grant = await repo.findGrant(tx, hashLinkToken(token));
      const refuse = (reason: string, error: AppError) => {
        logger.warn({ workshopId: wall.workshopId, deviceId: wall.deviceId, technicianId, reason }, 'wall clock grant refused');
        return error;
      };
      if (!grant || grant.workshopId !== wall.workshopId || grant.deviceId !== wall.deviceId || grant.technicianId !== technicianId) {
        throw refuse(grant ? 'another screen or technician' : 'unknown or ended', grantRefused(NOT_THIS_GRANT));
      }
      if (grant.deviceRevokedAt) throw refuse('screen unpaired', grantRefused('This wall screen was unpaired; its grants no longer work.'));
      const nowAt = now();
      if (grant.expiresAt <= nowAt) throw refuse('expired', grantRefused('This grant has expired. Enter the PIN to send the action.'));
      const atMs = at === undefined ? nowAt.getTime() : Date.parse(at);
      const from = grant.issuedAt.getTime();
      if (atMs < from || atMs > from + GRANT_WINDOW_MS) {
        const message = `A grant covers only actions made within ${WALL_GRANT_WINDOW_MINUTES} minutes of the PIN check it came from. Enter the PIN to send this action.`;
        throw refuse('time outside its window', grantRefused(message, { at: [message] }));
      }
    },

    /** A member sets their own PIN, confirming with their account password. */
    async setOwn(auth: AuthContext, input: SetOwnPinInput) {
      const passwordHash = await repo.passwordHash(auth.userId);
      if (!passwordHash || !(await verifyPassword(passwordHash, input.password))) {
        throw new AppError('invalid_credentials', 400, 'That is not your password', { password: ['That is not your password'] });
      }
      const me = (await repo.memberByUser(auth.workshopId, auth.userId))!;
      await setPin(auth.workshopId, me, input.pin, auth.userId);
    },

    /** The owner sets a member's PIN (which also clears any lock). */
    async setForMember(auth: AuthContext, membershipId: string, input: SetMemberPinInput) {
      const member = await repo.memberById(auth.workshopId, membershipId);
      if (!member) throw notFound('That member');
      await setPin(auth.workshopId, member, input.pin, auth.userId);
    },

    async technicians(workshopId: string): Promise<BenchTechnician[]> {
      const at = now();
      return (await repo.activeMembers(workshopId)).map((m) => ({
        id: m.userId,
        membershipId: m.membershipId,
        name: m.name,
        role: m.role,
        hasPin: m.pinHash !== null,
        lockedUntil: toStatus(m, at).lockedUntil,
      }));
    },

    async ownStatus(auth: AuthContext): Promise<PinStatus> {
      return toStatus((await repo.memberByUser(auth.workshopId, auth.userId))!, now());
    },

    async memberStatus(workshopId: string, membershipId: string): Promise<PinStatus> {
      const member = await repo.memberById(workshopId, membershipId);
      if (!member) throw notFound('That member');
      return toStatus(member, now());
    },

    /** An owner or foreman lifts a PIN lock before it runs out. */
    unlock: (auth: AuthContext, membershipId: string): Promise<PinStatus> =>
      repo.transaction(async (tx) => {
        const member = await repo.memberById(auth.workshopId, membershipId, tx);
        if (!member) throw notFound('That member');
        const at = now();
        await repo.setFailures(tx, member.membershipId, 0, null);
        await repo.recordEvent(tx, { workshopId: auth.workshopId, membershipId, actorUserId: auth.userId, kind: 'pin_unlocked', at });
        logger.info({ workshopId: auth.workshopId, membershipId, by: auth.userId }, 'technician PIN unlocked');
        return toStatus({ ...member, pinFailedCount: 0, pinLockedUntil: null }, at);
      }),
  };
}

export type PinsService = ReturnType<typeof createPinsService>;
