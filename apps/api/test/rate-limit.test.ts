import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from './schemas';
import { createTestApp, signUpWorkshop, uniqueEmail, type TestApp } from './helpers';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ limits: { signInPerAccount: 3, signInPerAddress: 8, resetPerAccount: 2, resetPerAddress: 50 } });
});
afterAll(() => t.close());

describe('POST /api/auth/sign-in limits', () => {
  it('when one account has too many failed sign-ins, then 429 even with the right password', async () => {
    const { input } = await signUpWorkshop(t);
    for (let i = 0; i < 3; i += 1) {
      await t.request().post('/api/auth/sign-in').send({ email: input.email, password: 'wrong password' }).expect(401);
    }
    const res = await t.request().post('/api/auth/sign-in').send({ email: input.email, password: input.password }).expect(429);
    expect(ErrorBody.parse(res.body).error.code).toBe('rate_limited');
    expect(res.headers['ratelimit-policy'] ?? res.headers['ratelimit']).toBeDefined();
  });

  it('when sign-ins succeed, then they do not count toward the limit', async () => {
    const { input } = await signUpWorkshop(t);
    for (let i = 0; i < 5; i += 1) {
      await t.request().post('/api/auth/sign-in').send({ email: input.email, password: input.password }).expect(200);
    }
  });

  it('when one address fails across many accounts, then that address is limited', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 10; i += 1) {
      const res = await t.request().post('/api/auth/sign-in').send({ email: uniqueEmail('spray'), password: 'guess guess' });
      statuses.push(res.status);
    }
    expect(statuses).toContain(429);
  });
});

describe('POST /api/auth/password-reset limits', () => {
  it('when one account asks too often, then 429', async () => {
    const email = uniqueEmail('reset');
    await t.request().post('/api/auth/password-reset').send({ email }).expect(202);
    await t.request().post('/api/auth/password-reset').send({ email }).expect(202);
    const res = await t.request().post('/api/auth/password-reset').send({ email }).expect(429);
    expect(res.body.error.code).toBe('rate_limited');
  });
});
