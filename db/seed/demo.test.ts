import { describe, expect, it } from 'vitest';
import { DEMO_MEMBERS as printed, DEMO_PASSWORD as printedPassword } from '../../scripts/lib/demo-sign-ins.mjs';
import { DEMO_MEMBERS, DEMO_PASSWORD } from './demo';

describe('demo sign-ins', () => {
  it('when npm start prints the sign-ins, then they are exactly the seeded members', () => {
    expect(printed.map((m) => [m.email, m.role])).toEqual(DEMO_MEMBERS.map((m) => [m.email, m.role]));
    expect(printedPassword).toBe(DEMO_PASSWORD);
  });
});
