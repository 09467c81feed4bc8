import { describe, expect, it } from 'vitest';
import { changedKeys, editFrom, reapply, type JobDraft } from './job-draft';

const base: JobDraft = {
  title: 'New hammers, rebush and regulation',
  status: 'active',
  priority: 'normal',
  promisedOn: '',
  isBlocked: false,
  blockedReason: '',
  notes: '',
};

describe('editFrom', () => {
  it('when nothing changed, then the edit is empty', () => {
    expect(editFrom(base, { ...base })).toEqual({});
  });

  it('when a date is cleared, then it is sent as null', () => {
    expect(editFrom({ ...base, promisedOn: '2026-03-20' }, base)).toEqual({ promisedOn: null });
  });

  it('when only the reason of a blocked job changes, then the blocked flag goes with it', () => {
    const blocked = { ...base, isBlocked: true, blockedReason: 'Waiting for parts' };
    expect(editFrom(blocked, { ...blocked, blockedReason: 'Waiting for the client' })).toEqual({
      isBlocked: true,
      blockedReason: 'Waiting for the client',
    });
  });
});

describe('reapply', () => {
  it('when someone else changed other fields, then their changes stay and mine go on top', () => {
    const mine = { ...base, priority: 'urgent' as const };
    const theirs = { ...base, notes: 'Loose key bushings throughout' };
    expect(reapply(theirs, base, mine)).toEqual({ ...base, priority: 'urgent', notes: 'Loose key bushings throughout' });
    expect(changedKeys(base, theirs)).toEqual(['notes']);
  });
});
