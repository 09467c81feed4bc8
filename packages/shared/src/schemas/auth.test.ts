import { describe, expect, it } from 'vitest';
import { SignInInput, SignUpInput, PasswordResetConfirmInput } from './auth';
import { AcceptInvitationInput, CreateInvitationInput, UpdateMemberInput } from './team';

const fieldsOf = (result: { success: boolean; error?: { issues: Array<{ path: PropertyKey[] }> } }) =>
  (result.error?.issues ?? []).map((i) => i.path.join('.'));

describe('SignUpInput', () => {
  it.each([
    [{ workshopName: 'Fennick Cross Piano Works', name: 'Margaret Oyelaran', email: 'margaret@fennick.example', password: 'keybed-demo' }, []],
    [{ workshopName: ' ', name: 'M', email: 'm@fennick.example', password: 'keybed-demo' }, ['workshopName']],
    [{ workshopName: 'Works', name: '', email: 'no-at-sign', password: 'short' }, ['name', 'email', 'password']],
    [{ workshopName: 'Works', name: 'M', email: 'm@fennick.example', password: 'x'.repeat(257) }, ['password']],
    [{}, ['workshopName', 'name', 'email', 'password']],
  ])('%j → problems in %j', (input, fields) => {
    expect(fieldsOf(SignUpInput.safeParse(input))).toEqual(fields);
  });

  it('when the e-mail has capitals and spaces, then it is trimmed and lower-cased', () => {
    const parsed = SignUpInput.parse({ workshopName: 'Works', name: 'M', email: '  Margaret@Fennick.Example ', password: 'keybed-demo' });
    expect(parsed.email).toBe('margaret@fennick.example');
  });
});

describe('SignInInput', () => {
  it.each([
    [{ email: 'tom@fennick.example', password: 'x' }, true],
    [{ email: 'tom@fennick.example', password: '' }, false],
    [{ email: 'tom', password: 'keybed-demo' }, false],
    [{ email: 42, password: ['a'] }, false],
    [null, false],
  ])('%j → valid %s', (input, valid) => {
    expect(SignInInput.safeParse(input).success).toBe(valid);
  });
});

describe('team and link schemas', () => {
  it('refuses unknown roles, bad e-mails, empty member updates and malformed link tokens', () => {
    expect(fieldsOf(CreateInvitationInput.safeParse({ email: 'priya@', role: 'admin' }))).toEqual(['email', 'role']);
    expect(UpdateMemberInput.safeParse({}).success).toBe(false);
    expect(UpdateMemberInput.safeParse({ isActive: false }).success).toBe(true);
    expect(AcceptInvitationInput.safeParse({ token: '../../etc/passwd', name: 'Ana Sousa', password: 'long enough' }).success).toBe(false);
    expect(PasswordResetConfirmInput.safeParse({ token: 'a'.repeat(43), password: 'long enough' }).success).toBe(true);
  });
});
