import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody, Invitation, InvitationPreview, Member } from './schemas';
import { addMember, createTestApp, linkToken, signUpWorkshop, uniqueEmail, waitForMail, type TestApp } from './helpers';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const ownerOnlyRoutes = [
  ['get', '/api/team/members'],
  ['patch', '/api/team/members/00000000-0000-4000-8000-000000000000'],
  ['get', '/api/team/invitations'],
  ['post', '/api/team/invitations'],
  ['delete', '/api/team/invitations/00000000-0000-4000-8000-000000000000'],
] as const;

describe('owner-only team routes', () => {
  it.each(['foreman', 'technician'] as const)('when a %s calls each of them, then 403 forbidden', async (role) => {
    const { agent: owner } = await signUpWorkshop(t);
    const { agent } = await addMember(t, owner, role);
    for (const [method, path] of ownerOnlyRoutes) {
      const res = await agent[method](path).send({ email: uniqueEmail('x'), role: 'owner' });
      expect(res.status, `${method} ${path}`).toBe(403);
      expect(ErrorBody.parse(res.body).error.code).toBe('forbidden');
    }
  });

  it('when nobody is signed in, then 401 on each of them', async () => {
    for (const [method, path] of ownerOnlyRoutes) {
      const res = await t.request()[method](path).send({});
      expect(res.status, `${method} ${path}`).toBe(401);
    }
  });
});

describe('POST /api/team/invitations and POST /api/invitations/accept', () => {
  it('when the invited person accepts the mailed link, then they join with the role and are signed in', async () => {
    const { agent: owner, input } = await signUpWorkshop(t);
    const email = uniqueEmail('priya');
    const created = await owner.post('/api/team/invitations').send({ email, role: 'technician' }).expect(201);
    expect(Invitation.parse(created.body)).toMatchObject({ email, role: 'technician' });
    const mail = await waitForMail(email);
    expect(mail.subject).toContain(input.workshopName);
    const token = linkToken(mail, 'invitations');

    const preview = await t.request().get(`/api/invitations/${token}`).expect(200);
    expect(InvitationPreview.parse(preview.body)).toMatchObject({ email, role: 'technician', workshopName: input.workshopName });

    const member = t.agent();
    const accepted = await member.post('/api/invitations/accept').send({ token, name: 'Priya Natarajan', password: 'a good password' }).expect(200);
    expect(accepted.body).toMatchObject({ role: 'technician', user: { email, name: 'Priya Natarajan' } });
    await member.get('/api/me').expect(200);
    const members = await owner.get('/api/team/members').expect(200);
    expect(members.body.members.map((m: Member) => m.email)).toContain(email);
    const pending = await owner.get('/api/team/invitations').expect(200);
    expect(pending.body.invitations).toEqual([]);
  });

  it('when the link is used a second time, then 400 token_invalid and nothing changes', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const email = uniqueEmail('twice');
    await owner.post('/api/team/invitations').send({ email, role: 'foreman' }).expect(201);
    const token = linkToken(await waitForMail(email), 'invitations');
    await t.request().post('/api/invitations/accept').send({ token, name: 'Tom Albright', password: 'first password' }).expect(200);
    const again = await t.request().post('/api/invitations/accept').send({ token, name: 'Someone Else', password: 'second password' }).expect(400);
    expect(ErrorBody.parse(again.body).error.code).toBe('token_invalid');
    await t.request().post('/api/auth/sign-in').send({ email, password: 'second password' }).expect(401);
  });

  it('when the link has expired, then preview and accept are refused', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const email = uniqueEmail('late');
    await owner.post('/api/team/invitations').send({ email, role: 'technician' }).expect(201);
    const token = linkToken(await waitForMail(email), 'invitations');
    await t.sql`update invitations set expires_at = now() - interval '1 minute' where email = ${email}`;
    await t.request().get(`/api/invitations/${token}`).expect(400);
    const res = await t.request().post('/api/invitations/accept').send({ token, name: 'Late Person', password: 'late password' }).expect(400);
    expect(res.body.error.code).toBe('token_invalid');
  });

  it('when the owner revokes the invitation, then its link stops working', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const email = uniqueEmail('revoked');
    const created = await owner.post('/api/team/invitations').send({ email, role: 'technician' }).expect(201);
    const token = linkToken(await waitForMail(email), 'invitations');
    await owner.delete(`/api/team/invitations/${created.body.id}`).expect(204);
    await t.request().get(`/api/invitations/${token}`).expect(400);
  });

  it('when the input is bad or the person is already a member, then 400 / 409 with fields', async () => {
    const { agent: owner, input } = await signUpWorkshop(t);
    const bad = await owner.post('/api/team/invitations').send({ email: 'nope', role: 'boss' }).expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['email', 'role']));
    const dup = await owner.post('/api/team/invitations').send({ email: input.email, role: 'foreman' }).expect(409);
    expect(dup.body.error.code).toBe('conflict');
  });
});

describe('PATCH /api/team/members/:id', () => {
  it('when a member is deactivated, then their sessions end at once', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const tech = await addMember(t, owner, 'technician');
    const list = await owner.get('/api/team/members').expect(200);
    const row = list.body.members.find((m: Member) => m.email === tech.email);
    const res = await owner.patch(`/api/team/members/${row.id}`).send({ isActive: false }).expect(200);
    expect(Member.parse(res.body).isActive).toBe(false);
    await tech.agent.get('/api/me').expect(401);
    await t.request().post('/api/auth/sign-in').send({ email: tech.email, password: 'member password 1' }).expect(401);
  });

  it('when a role changes, then the next request already uses the new role', async () => {
    const { agent: owner } = await signUpWorkshop(t);
    const tech = await addMember(t, owner, 'technician');
    await tech.agent.get('/api/team/members').expect(403);
    const list = await owner.get('/api/team/members').expect(200);
    const row = list.body.members.find((m: Member) => m.email === tech.email);
    await owner.patch(`/api/team/members/${row.id}`).send({ role: 'owner' }).expect(200);
    await tech.agent.get('/api/team/members').expect(200);
  });

  it('when the last active owner would be demoted or deactivated, then 409 last_owner', async () => {
    const { agent: owner, me } = await signUpWorkshop(t);
    const list = await owner.get('/api/team/members').expect(200);
    const self = list.body.members.find((m: Member) => m.userId === me.user.id);
    const demote = await owner.patch(`/api/team/members/${self.id}`).send({ role: 'foreman' }).expect(409);
    expect(demote.body.error.code).toBe('last_owner');
    await owner.patch(`/api/team/members/${self.id}`).send({ isActive: false }).expect(409);
    await owner.get('/api/me').expect(200);
  });

  it('when the body is empty or the id malformed, then 400', async () => {
    const { agent: owner, me } = await signUpWorkshop(t);
    const list = await owner.get('/api/team/members').expect(200);
    const self = list.body.members.find((m: Member) => m.userId === me.user.id);
    await owner.patch(`/api/team/members/${self.id}`).send({}).expect(400);
    await owner.patch('/api/team/members/not-a-uuid').send({ role: 'owner' }).expect(400);
  });
});

describe('tenant isolation', () => {
  it("when workshop A's owner reaches for workshop B's member or invitation, then 404 and B is unchanged", async () => {
    const a = await signUpWorkshop(t, 'a');
    const b = await signUpWorkshop(t, 'b');
    const bMembers = await b.agent.get('/api/team/members').expect(200);
    const bOwner = bMembers.body.members[0] as Member;
    const email = uniqueEmail('b-invitee');
    const bInvite = await b.agent.post('/api/team/invitations').send({ email, role: 'technician' }).expect(201);

    const aList = await a.agent.get('/api/team/members').expect(200);
    expect(aList.body.members.map((m: Member) => m.email)).not.toContain(b.input.email);
    const patch = await a.agent.patch(`/api/team/members/${bOwner.id}`).send({ isActive: false }).expect(404);
    expect(patch.body.error.code).toBe('not_found');
    await a.agent.delete(`/api/team/invitations/${bInvite.body.id}`).expect(404);
    const aInvites = await a.agent.get('/api/team/invitations').expect(200);
    expect(aInvites.body.invitations).toEqual([]);

    await b.agent.get('/api/me').expect(200);
    const bInvites = await b.agent.get('/api/team/invitations').expect(200);
    expect(bInvites.body.invitations).toHaveLength(1);
  });
});
