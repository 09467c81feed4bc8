import { PIN_FAILURES_BEFORE_LOCK, PIN_LOCK_MINUTES, type BenchTechnician, type PinStatus, type SetMemberPinInput, type SetOwnPinInput } from '@keybed/shared';
import type { AuthContext, WallContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import type { Logger } from '../../lib/logger';
import { hashPassword, verifyPassword } from '../../lib/password';
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
type Outcome = { member: PinMember } | { error: AppError; log?: { msg: string; membershipId?: string; failedCount?: number } };

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

  async function verify(wall: WallContext, technicianId: string, pin: string): Promise<Outcome> {
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
        return { member };
      }
      const failed = member.pinFailedCount + 1;
      const event = { workshopId: wall.workshopId, membershipId: member.membershipId, deviceId: wall.deviceId, at };
      await repo.recordEvent(tx, { ...event, kind: 'pin_failed', detail: { failedInARow: failed } });
      const { count } = await repo.deviceFailuresSince(tx, wall.deviceId, new Date(at.getTime() - HOUR_MS));
      if (count === devicePerHour) await repo.recordEvent(tx, { ...event, membershipId: null, kind: 'wall_pin_limit', detail: { failuresInHour: count } });
      if (failed >= PIN_FAILURES_BEFORE_LOCK) {
        const until = new Date(at.getTime() + LOCK_MS);
        await repo.setFailures(tx, member.membershipId, 0, until);
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
      await repo.recordEvent(tx, { workshopId, membershipId: target.membershipId, actorUserId, kind: 'pin_set', at });
    });
  }

  return {
    /** Checks the technician's PIN at a wall screen; answers the member, or throws after recording the failure. */
    async verifyAtWall(wall: WallContext, technicianId: string, pin: string): Promise<PinMember> {
      const outcome = await verify(wall, technicianId, pin);
      if ('member' in outcome) return outcome.member;
      if (outcome.log) {
        const { msg, ...fields } = outcome.log;
        logger.warn({ workshopId: wall.workshopId, deviceId: wall.deviceId, ...fields }, msg);
      }
      throw outcome.error;
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
