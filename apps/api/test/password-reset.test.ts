import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from './schemas';
import { createTestApp, linkToken, signUpWorkshop, uniqueEmail, waitForMail, type TestApp } from './helpers';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('POST /api/auth/password-reset and /confirm', () => {
  it('when the mailed link is used, then the password changes and every old session ends', async () => {
    const { agent, input } = await signUpWorkshop(t);
    const other = t.agent();
    await other.post('/api/auth/sign-in').send({ email: input.email, password: input.password }).expect(200);

    await t.request().post('/api/auth/password-reset').send({ email: input.email }).expect(202);
    const token = linkToken(await waitForMail(input.email), 'reset-password');
    await t.request().post('/api/auth/password-reset/confirm').send({ token, password: 'a brand new password' }).expect(204);

    await agent.get('/api/me').expect(401);
    await other.get('/api/me').expect(401);
    await t.request().post('/api/auth/sign-in').send({ email: input.email, password: input.password }).expect(401);
    await t.request().post('/api/auth/sign-in').send({ email: input.email, password: 'a brand new password' }).expect(200);
  });

  it('when the link is used twice or has expired, then 400 token_invalid', async () => {
    const { input } = await signUpWorkshop(t);
    await t.request().post('/api/auth/password-reset').send({ email: input.email }).expect(202);
    const token = linkToken(await waitForMail(input.email), 'reset-password');
    await t.request().post('/api/auth/password-reset/confirm').send({ token, password: 'first new password' }).expect(204);
    const again = await t.request().post('/api/auth/password-reset/confirm').send({ token, password: 'second new password' }).expect(400);
    expect(ErrorBody.parse(again.body).error.code).toBe('token_invalid');

    await t.request().post('/api/auth/password-reset').send({ email: input.email }).expect(202);
    const { tokenHash } = (await t.sql`select token_hash as "tokenHash" from password_resets where used_at is null order by created_at desc limit 1`)[0] as { tokenHash: string };
    await t.sql`update password_resets set expires_at = now() - interval '1 second' where token_hash = ${tokenHash}`;
    const lateToken = linkToken(await waitForMail(input.email), 'reset-password');
    await t.request().post('/api/auth/password-reset/confirm').send({ token: lateToken, password: 'too late password' }).expect(400);
  });

  it('when the e-mail has no account, then the answer is the same 202 and no mail is sent', async () => {
    const email = uniqueEmail('ghost');
    const res = await t.request().post('/api/auth/password-reset').send({ email }).expect(202);
    expect(res.body).toEqual({ status: 'sent-if-account-exists' });
    await expect(waitForMail(email, 800)).rejects.toThrow(/No e-mail/);
  });

  it('when the token or password is malformed, then 400 with fields', async () => {
    const res = await t.request().post('/api/auth/password-reset/confirm').send({ token: '../../etc', password: 'x' }).expect(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toEqual(expect.arrayContaining(['token', 'password']));
  });
});
