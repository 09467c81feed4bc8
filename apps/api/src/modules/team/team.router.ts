import { Router } from 'express';
import { AcceptInvitationInput, CreateInvitationInput, IdParams, TokenParams, UpdateMemberInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { setSessionCookie } from '../../http/session';
import type { SessionStore } from '../../lib/sessions';
import type { AuthService } from '../auth/auth.service';
import type { TeamService } from './team.service';

const OWNER = ['owner'] as const;

export function teamRouter(service: TeamService, auth: AuthService, sessions: SessionStore) {
  const router = Router();
  const r = routesOn(router);

  r.get('/team/members', OWNER, async (req, res) => {
    res.json({ members: await service.listMembers(authOf(req).workshopId) });
  });

  r.patch('/team/members/:id', OWNER, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.updateMember(authOf(req), id, parse(UpdateMemberInput, req.body)));
  });

  r.get('/team/invitations', OWNER, async (req, res) => {
    res.json({ invitations: await service.listInvitations(authOf(req).workshopId) });
  });

  r.post('/team/invitations', OWNER, async (req, res) => {
    res.status(201).json(await service.invite(authOf(req), parse(CreateInvitationInput, req.body)));
  });

  r.delete('/team/invitations/:id', OWNER, async (req, res) => {
    await service.revokeInvitation(authOf(req).workshopId, parse(IdParams, req.params).id);
    res.status(204).end();
  });

  r.get('/invitations/:token', 'public', async (req, res) => {
    res.json(await service.previewInvitation(parse(TokenParams, req.params).token));
  });

  r.post('/invitations/accept', 'public', async (req, res) => {
    const ids = await service.acceptInvitation(parse(AcceptInvitationInput, req.body));
    if (req.auth) await sessions.end(req.auth.sessionId);
    const session = await sessions.start(ids.userId, ids.workshopId);
    setSessionCookie(req, res, session);
    res.json(await auth.me(ids.userId, ids.workshopId));
  });

  return router;
}
