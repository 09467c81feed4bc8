import { Router } from 'express';
import { ApproveWeekInput, ClockOffInput, ClockOnInput, CorrectionInput, IdParams, TimeEntryQuery, TimesheetQuery } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import type { ClockActor, ClockService } from './clock.service';
import type { EntriesService } from './entries.service';
import { timesheetCsv, timesheetFileName } from './timesheet-csv';
import type { TimesheetsService } from './timesheets.service';

const SUPERVISORS = ['owner', 'foreman'] as const;

/** Bench time for signed-in members: clock on and off for oneself, entries, corrections, weeks. */
export function timeRouter(clock: ClockService, entries: EntriesService, timesheets: TimesheetsService) {
  const router = Router();
  const r = routesOn(router);
  const self = (auth: ReturnType<typeof authOf>): ClockActor => ({ workshopId: auth.workshopId, technicianId: auth.userId, byUserId: auth.userId, source: 'web' });

  r.post('/time/clock-on', 'member', async (req, res) => {
    const auth = authOf(req);
    const { result, isNew } = await clock.clockOn(self(auth), parse(ClockOnInput, req.body));
    res.status(isNew ? 201 : 200).json(result);
  });

  r.post('/time/clock-off', 'member', async (req, res) => {
    const auth = authOf(req);
    res.json((await clock.clockOff(self(auth), parse(ClockOffInput, req.body ?? {}))).result);
  });

  r.get('/time/running', 'member', async (req, res) => {
    res.json({ running: await clock.running(authOf(req).workshopId) });
  });

  r.get('/time/entries', 'member', async (req, res) => {
    res.json({ entries: await entries.list(authOf(req), parse(TimeEntryQuery, req.query)) });
  });

  r.patch('/time/entries/:id', SUPERVISORS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await entries.correct(authOf(req), id, parse(CorrectionInput, req.body)));
  });

  r.get('/time/weeks', 'member', async (req, res) => {
    const query = parse(TimesheetQuery, req.query);
    const week = await timesheets.week(authOf(req), query);
    if (query.format === 'json') return void res.json(week);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${timesheetFileName(week)}"`);
    res.send(timesheetCsv(week));
  });

  r.post('/time/weeks/approve', SUPERVISORS, async (req, res) => {
    res.json(await timesheets.approve(authOf(req), parse(ApproveWeekInput, req.body)));
  });

  return router;
}
