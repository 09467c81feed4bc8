import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { isGrantRefusal, isNetworkFailure, outcomeOfError } from './send-outcome';

const apiError = (status: number, code: ConstructorParameters<typeof ApiError>[0]['code'], message = 'Refused') => new ApiError({ status, code, message });

describe('outcomeOfError', () => {
  it('when the network is down, then the action waits', () => {
    expect(outcomeOfError(apiError(0, 'network_error'), true)).toMatchObject({ kind: 'stopped' });
    expect(outcomeOfError(new TypeError('Failed to fetch'), true)).toMatchObject({ kind: 'stopped' });
    expect(outcomeOfError(apiError(409, 'task_not_open'), false)).toMatchObject({ kind: 'stopped' });
  });

  it('when the PIN is wrong or locked, the grant is refused, or the server is in trouble, then the action waits for another try', () => {
    for (const error of [apiError(403, 'pin_incorrect'), apiError(403, 'grant_refused'), apiError(429, 'pin_locked'), apiError(429, 'wall_pin_limit'), apiError(503, 'service_unavailable'), apiError(500, 'internal')]) {
      expect(outcomeOfError(error, true)).toMatchObject({ kind: 'stopped' });
    }
  });

  it('when the API refuses the action itself, then it is set aside with the API’s words', () => {
    expect(outcomeOfError(apiError(409, 'task_not_open', '“Rebush keys” is done. Choose an open task.'), true)).toEqual({
      kind: 'refused',
      code: 'task_not_open',
      message: '“Rebush keys” is done. Choose an open task.',
    });
    expect(outcomeOfError(apiError(409, 'not_running'), true)).toMatchObject({ kind: 'refused' });
    expect(outcomeOfError(apiError(400, 'validation_failed'), true)).toMatchObject({ kind: 'refused' });
  });
});

describe('isGrantRefusal', () => {
  it('when the API refuses the grant, then only the PIN can send the action; other refusals are not about the grant', () => {
    expect(isGrantRefusal(apiError(403, 'grant_refused'))).toBe(true);
    expect(isGrantRefusal(apiError(403, 'pin_incorrect'))).toBe(false);
    expect(isGrantRefusal(new TypeError('Failed to fetch'))).toBe(false);
  });
});

describe('isNetworkFailure', () => {
  it('when the browser is offline, then any failure counts as the network', () => {
    expect(isNetworkFailure(apiError(500, 'internal'), false)).toBe(true);
    expect(isNetworkFailure(apiError(500, 'internal'), true)).toBe(false);
  });
});
