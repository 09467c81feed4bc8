import { Router } from 'express';
import { PasswordResetConfirmInput, PasswordResetRequestInput, SignInInput, SignUpInput } from '@keybed/shared';
import { authOf, routesOn } from '../../http/context';
import { parse } from '../../http/parse';
import { resetLimits, signInLimits } from '../../http/security';
import { clearSessionCookie, setSessionCookie } from '../../http/session';
import type { SessionStore } from '../../lib/sessions';
import type { Config } from '../../config/env';
import type { AuthService } from './auth.service';

export function authRouter(service: AuthService, sessions: SessionStore, limits: Config['limits']) {
  const router = Router();
  const r = routesOn(router);

  r.post('/auth/sign-up', 'public', async (req, res) => {
    const session = await service.signUp(parse(SignUpInput, req.body));
    setSessionCookie(req, res, session);
    res.status(201).json(await service.me(session.userId, session.workshopId));
  });

  r.post('/auth/sign-in', 'public', ...signInLimits(limits.signInPerAccount, limits.signInPerAddress), async (req, res) => {
    const input = parse(SignInInput, req.body);
    if (req.auth) await sessions.end(req.auth.sessionId);
    const session = await service.signIn(input);
    setSessionCookie(req, res, session);
    res.json(await service.me(session.userId, session.workshopId));
  });

  r.post('/auth/sign-out', 'public', async (req, res) => {
    if (req.auth) await sessions.end(req.auth.sessionId);
    clearSessionCookie(req, res);
    res.status(204).end();
  });

  r.get('/me', 'member', async (req, res) => {
    const auth = authOf(req);
    res.json(await service.me(auth.userId, auth.workshopId));
  });

  r.post('/auth/password-reset', 'public', ...resetLimits(limits.resetPerAccount, limits.resetPerAddress), async (req, res) => {
    await service.requestPasswordReset(parse(PasswordResetRequestInput, req.body).email);
    res.status(202).json({ status: 'sent-if-account-exists' });
  });

  r.post('/auth/password-reset/confirm', 'public', async (req, res) => {
    await service.confirmPasswordReset(parse(PasswordResetConfirmInput, req.body));
    clearSessionCookie(req, res);
    res.status(204).end();
  });

  return router;
}
