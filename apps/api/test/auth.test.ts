import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody, Me } from './schemas';
import { APP_ORIGIN, createTestApp, sessionCookieOf, signUpWorkshop, uniqueEmail, type TestApp } from './helpers';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('POST /api/auth/sign-up', () => {
  it('when the input is valid, then it creates the workshop with its owner and signs in', async () => {
    const { agent, input, me } = await signUpWorkshop(t);
    expect(Me.parse(me)).toMatchObject({ role: 'owner', workshop: { name: input.workshopName }, user: { email: input.email } });
    const res = await agent.get('/api/me').expect(200);
    expect(res.body.user.email).toBe(input.email);
  });

  it('when the e-mail already has an account, then 409 email_taken on the email field', async () => {
    const { input } = await signUpWorkshop(t);
    const res = await t.request().post('/api/auth/sign-up').send({ ...input, workshopName: 'Another' }).expect(409);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'email_taken', fields: { email: expect.any(Array) } });
  });

  it('when fields are missing or bad, then 400 with an error per field and nothing created', async () => {
    const email = uniqueEmail('bad');
    const res = await t.request().post('/api/auth/sign-up').send({ workshopName: ' ', name: '', email, password: 'short' }).expect(400);
    const { error } = ErrorBody.parse(res.body);
    expect(error.code).toBe('validation_failed');
    expect(Object.keys(error.fields ?? {})).toEqual(expect.arrayContaining(['workshopName', 'name', 'password']));
    await t.request().post('/api/auth/sign-in').send({ email, password: 'short' }).expect(401);
  });
});

describe('POST /api/auth/sign-in', () => {
  it('when the password is right, then 200 with the member and an httpOnly SameSite=Lax cookie', async () => {
    const { input } = await signUpWorkshop(t);
    const res = await t.request().post('/api/auth/sign-in').send({ email: input.email.toUpperCase(), password: input.password }).expect(200);
    expect(Me.parse(res.body).user.email).toBe(input.email);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/keybed_session=[a-z0-9]+/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/); // plain HTTP here; Secure is set when served over HTTPS
  });

  it('when the password is wrong or the account unknown, then 401 with the same generic message', async () => {
    const { input } = await signUpWorkshop(t);
    const wrong = await t.request().post('/api/auth/sign-in').send({ email: input.email, password: 'not the password' }).expect(401);
    const unknown = await t.request().post('/api/auth/sign-in').send({ email: uniqueEmail('nobody'), password: 'whatever1' }).expect(401);
    expect(ErrorBody.parse(wrong.body).error.code).toBe('invalid_credentials');
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('when the body is malformed, then 400 with fields', async () => {
    const res = await t.request().post('/api/auth/sign-in').send({ email: 'not-an-email' }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('email');
    expect(res.body.error.fields).toHaveProperty('password');
    const bad = await t.request().post('/api/auth/sign-in').set('content-type', 'application/json').send('{oops').expect(400);
    expect(bad.body.error.code).toBe('validation_failed');
  });

  it('when a member signs in again, then the session id is rotated and the old one no longer works', async () => {
    const { agent, input, cookie: oldCookie } = await signUpWorkshop(t);
    await t.request().get('/api/me').set('cookie', oldCookie).expect(200);
    const res = await agent.post('/api/auth/sign-in').send({ email: input.email, password: input.password }).expect(200);
    expect(sessionCookieOf(res.headers['set-cookie'])).not.toBe(oldCookie);
    await agent.get('/api/me').expect(200);
    await t.request().get('/api/me').set('cookie', oldCookie).expect(401);
  });

  it('when the request comes from another site, then 403 forbidden_origin', async () => {
    const { input } = await signUpWorkshop(t);
    const res = await t.request().post('/api/auth/sign-in').set('origin', 'https://elsewhere.example').send({ email: input.email, password: input.password }).expect(403);
    expect(res.body.error.code).toBe('forbidden_origin');
    await t.request().post('/api/auth/sign-in').set('origin', APP_ORIGIN).send({ email: input.email, password: input.password }).expect(200);
  });
});

describe('POST /api/auth/sign-out and GET /api/me', () => {
  it('when signed out, then 204 and /api/me is 401 with the session gone', async () => {
    const { agent } = await signUpWorkshop(t);
    await agent.post('/api/auth/sign-out').expect(204);
    const res = await agent.get('/api/me').expect(401);
    expect(ErrorBody.parse(res.body).error.code).toBe('unauthenticated');
  });

  it('when there is no session, then /api/me is 401', async () => {
    await t.request().get('/api/me').expect(401);
  });

  it('when a session is past half its idle span, then it is extended and the cookie sent again', async () => {
    const { agent, me } = await signUpWorkshop(t);
    await t.sql`update sessions set expires_at = now() + interval '1 hour' where user_id = ${me.user.id}`;
    const res = await agent.get('/api/me').expect(200);
    expect(String(res.headers['set-cookie'])).toMatch(/keybed_session=/);
    const [row] = await t.sql`select expires_at > now() + interval '7 hours' as "isExtended" from sessions where user_id = ${me.user.id}`;
    expect(row?.isExtended).toBe(true);
  });

  it('when a session has passed its idle expiry, then it is refused and removed', async () => {
    const { agent, me } = await signUpWorkshop(t);
    await t.sql`update sessions set expires_at = now() - interval '1 second' where user_id = ${me.user.id}`;
    await agent.get('/api/me').expect(401);
    const rows = await t.sql`select 1 from sessions where user_id = ${me.user.id}`;
    expect(rows).toHaveLength(0);
  });

  it('when a session passes its absolute lifetime, then it is refused even while in use', async () => {
    const { agent, me } = await signUpWorkshop(t);
    await t.sql`update sessions set created_at = now() - interval '13 hours' where user_id = ${me.user.id}`;
    await agent.get('/api/me').expect(401);
  });
});

describe('headers', () => {
  it('when any response is sent, then it carries a CSP without inline scripts and a request id', async () => {
    const res = await t.request().get('/api/health');
    const csp = String(res.headers['content-security-policy']);
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("base-uri 'none'");
    expect(csp).not.toContain('unsafe-inline');
    expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('when an API route does not exist, then 404 in the error shape', async () => {
    const res = await t.request().get('/api/no-such-thing').expect(404);
    expect(ErrorBody.parse(res.body).error.code).toBe('not_found');
  });
});
