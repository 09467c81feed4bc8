import type {
  PairWallInput,
  RunningEntry,
  WallClockOffInput,
  WallClockOnInput,
  WallDevice,
  WallPairing,
  WallPinCheck,
  WallTask,
  WallTechnician,
} from '@keybed/shared';
import type { AuthContext, WallContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import type { Logger } from '../../lib/logger';
import { hashLinkToken, newLinkToken } from '../../lib/tokens';
import type { PinsService } from '../pins/pins.service';
import type { ClockActor, ClockService } from '../time/clock.service';
import type { WallRepo } from './wall.repo';

interface Deps {
  repo: WallRepo;
  pins: PinsService;
  clock: ClockService;
  logger: Logger;
  now: () => Date;
}

/** How often a screen's "last seen" is written at most. */
const SEEN_EVERY_MS = 60_000;

const pianoLabel = (p: { maker: string; model: string; type: string }) => [p.maker, p.model, p.type].filter((s) => s.trim() !== '').join(' ');

/**
 * The wall screen: a browser an owner or foreman paired, holding a long-lived device token (only
 * its SHA-256 is stored) that allows the wall actions and nothing else. Each clock action names
 * the technician and carries the PIN they just entered, or, for an action the screen kept while
 * the network was down, the clock grant their PIN check gave this screen.
 */
export function createWallService({ repo, pins, clock, logger, now }: Deps) {
  async function runningOf(workshopId: string): Promise<Map<string, RunningEntry>> {
    return new Map((await clock.running(workshopId)).map((r) => [r.technician.id, r]));
  }

  /** Who is acting: the PIN is checked now; a grant is checked inside the action's transaction. */
  async function actorFor(wall: WallContext, input: { technicianId: string; pin?: string | undefined; grant?: string | undefined; at?: string | undefined }): Promise<ClockActor> {
    const { technicianId, pin, grant, at } = input;
    const actor: ClockActor = { workshopId: wall.workshopId, technicianId, byUserId: technicianId, source: 'wall', deviceId: wall.deviceId };
    if (pin !== undefined) {
      await pins.verifyAtWall(wall, technicianId, pin);
      return actor;
    }
    if (grant === undefined) {
      const message = 'Enter the 6-digit PIN, or send the grant from the PIN check';
      throw new AppError('validation_failed', 400, message, { pin: [message], grant: [message] });
    }
    return { ...actor, authorise: (tx) => pins.checkGrant(tx, wall, technicianId, grant, at) };
  }

  return {
    /** Makes a device token for a new wall screen; answers the token for the cookie and the pairing. */
    async pair(auth: AuthContext, input: PairWallInput): Promise<{ token: string; pairing: WallPairing }> {
      const { token, tokenHash } = newLinkToken();
      const deviceId = await repo.transaction(async (tx) => {
        const at = now();
        const id = await repo.insertDevice(tx, { workshopId: auth.workshopId, name: input.name, tokenHash, pairedBy: auth.userId, createdAt: at });
        await repo.recordEvent(tx, { workshopId: auth.workshopId, deviceId: id, actorUserId: auth.userId, kind: 'wall_paired', at, detail: { name: input.name } });
        return id;
      });
      logger.info({ workshopId: auth.workshopId, deviceId, by: auth.userId }, 'wall screen paired');
      return { token, pairing: (await repo.pairing(auth.workshopId, deviceId))! };
    },

    /** The device behind a token: its context, `revoked` for an unpaired one, or undefined. */
    async resolve(token: string): Promise<WallContext | 'revoked' | undefined> {
      const device = await repo.findByTokenHash(hashLinkToken(token));
      if (!device) return undefined;
      if (device.revokedAt) return 'revoked';
      const at = now();
      if (!device.lastSeenAt || at.getTime() - device.lastSeenAt.getTime() > SEEN_EVERY_MS) await repo.touch(device.id, at, SEEN_EVERY_MS);
      return { deviceId: device.id, workshopId: device.workshopId };
    },

    session: async (wall: WallContext): Promise<WallPairing> => (await repo.pairing(wall.workshopId, wall.deviceId))!,

    async devices(workshopId: string): Promise<WallDevice[]> {
      return (await repo.devices(workshopId)).map((d) => ({
        ...d,
        createdAt: d.createdAt.toISOString(),
        lastSeenAt: d.lastSeenAt?.toISOString() ?? null,
        revokedAt: d.revokedAt?.toISOString() ?? null,
      }));
    },

    /** Unpairs a screen at once: its next request is refused. Revoking twice is harmless. */
    async revoke(auth: AuthContext, deviceId: string) {
      if (!(await repo.deviceExists(auth.workshopId, deviceId))) throw notFound('That wall screen');
      await repo.transaction(async (tx) => {
        const at = now();
        if (await repo.revoke(tx, auth.workshopId, deviceId, auth.userId, at)) {
          await repo.recordEvent(tx, { workshopId: auth.workshopId, deviceId, actorUserId: auth.userId, kind: 'wall_revoked', at });
        }
      });
      logger.info({ workshopId: auth.workshopId, deviceId, by: auth.userId }, 'wall screen revoked');
    },

    /** Everyone who clocks on at the wall, with what they are on now and any PIN lock. */
    async technicians(wall: WallContext): Promise<WallTechnician[]> {
      const [people, running] = await Promise.all([repo.wallPeople(wall.workshopId), runningOf(wall.workshopId)]);
      const at = now();
      return people.map((p) => ({
        id: p.id,
        name: p.name,
        hasPin: p.hasPin,
        lockedUntil: p.lockedUntil && p.lockedUntil > at ? p.lockedUntil.toISOString() : null,
        running: running.get(p.id) ?? null,
      }));
    },

    running: (wall: WallContext) => clock.running(wall.workshopId),

    /**
     * Checks the PIN; answers what the technician is on, the open tasks (assigned ones first) and
     * a clock grant with which this screen can send, later, what they do in the next few minutes.
     */
    async verifyPin(wall: WallContext, technicianId: string, pin: string): Promise<WallPinCheck> {
      const { member, grant } = await pins.grantAtWall(wall, technicianId, pin);
      const [rows, running] = await Promise.all([repo.openTasks(wall.workshopId, technicianId), runningOf(wall.workshopId)]);
      const tasks: WallTask[] = rows.map((t) => ({
        id: t.id,
        title: t.title,
        status: t.status,
        isAssigned: t.isAssigned,
        job: { ...t.job, pianoLabel: pianoLabel(t.piano) },
        stage: t.stage,
      }));
      return { technician: { id: member.userId, name: member.name }, running: running.get(member.userId) ?? null, tasks, grant };
    },

    async clockOn(wall: WallContext, input: WallClockOnInput) {
      const { technicianId: _technician, pin: _pin, grant: _grant, ...action } = input;
      return clock.clockOn(await actorFor(wall, input), action);
    },

    async clockOff(wall: WallContext, input: WallClockOffInput) {
      const { technicianId: _technician, pin: _pin, grant: _grant, ...action } = input;
      return clock.clockOff(await actorFor(wall, input), action);
    },
  };
}

export type WallService = ReturnType<typeof createWallService>;
