import { Router } from 'express';
import { authOf, routesOn } from '../../http/context';
import { AppError } from '../../http/errors';
import type { LiveEvents } from '../../lib/live-events';
import type { EventsRepo } from './events.repo';

/**
 * `GET /api/events`: a Server-Sent Events stream of the member's workshop's live events
 * (`LiveEvent`: kind, id, at). The response starts only once this process is listening; the
 * stream ends at the first heartbeat after the member's session ends.
 */
export function eventsRouter(live: LiveEvents, repo: EventsRepo, now: () => Date) {
  const router = Router();
  routesOn(router).get('/events', 'member', async (req, res) => {
    const { workshopId, sessionId } = authOf(req);
    await live.ready().catch(() => {
      throw new AppError('service_unavailable', 503, 'Live updates are not available right now. The page retries by itself.');
    });
    res.writeHead(200, {
      'Content-Type': 'text/event-stream; charset=utf-8',
      'Cache-Control': 'no-store',
      Connection: 'keep-alive',
      'X-Accel-Buffering': 'no',
    });
    const stop = live.subscribe(workshopId, res, { isStillAllowed: () => repo.isSessionLive(sessionId, now()) });
    res.on('close', stop);
  });
  return router;
}
