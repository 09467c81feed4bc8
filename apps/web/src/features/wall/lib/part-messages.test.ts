import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { isWhoRefusal, logButtonText, loggedText, partRefusalText } from './part-messages';

// The demo catalogue and tasks (SCENARIO.md).
const hammers = { id: 'p1', name: 'Hammer set, grand, 88', unit: 'set' };
const cloth = { id: 'p3', name: 'Key bushing cloth', unit: 'm' };

describe('logButtonText and loggedText', () => {
  it('when a quantity is chosen, then the button and the confirmation say how much of what, and to which task', () => {
    expect(logButtonText(hammers, 1000)).toBe('Log 1 set of Hammer set, grand, 88');
    expect(logButtonText(cloth, 1500)).toBe('Log 1.5 m of Key bushing cloth');
    expect(logButtonText(cloth, undefined)).toBe('Log Key bushing cloth');
    expect(loggedText({ task: { id: 't4', title: 'Hang new hammers' }, part: hammers, quantityMilli: 1000 })).toBe('Logged 1 set of Hammer set, grand, 88 to Hang new hammers.');
  });
});

describe('partRefusalText', () => {
  it('when there is not enough in stock, then it says how much is on hand, from the API’s answer, and that nothing was logged', () => {
    const error = new ApiError({ status: 409, code: 'insufficient_stock', message: 'Not enough in stock: 0.5 on hand', details: { onHandMilli: 500 } });
    expect(partRefusalText(error, cloth)).toBe('Not enough in stock: 0.5 m of Key bushing cloth on hand. Nothing was logged. Ask the foreman to record the delivery, then log it again.');
    const none = new ApiError({ status: 409, code: 'insufficient_stock', message: 'Not enough in stock: 0 on hand', details: { onHandMilli: 0 } });
    expect(partRefusalText(none, hammers)).toBe('Not enough in stock: no Hammer set, grand, 88 on hand. Nothing was logged. Ask the foreman to record the delivery, then log it again.');
    const bare = new ApiError({ status: 409, code: 'insufficient_stock', message: 'Not enough in stock for that' });
    expect(partRefusalText(bare, hammers)).toBe('Not enough Hammer set, grand, 88 in stock for that. Nothing was logged. Ask the foreman to record the delivery, then log it again.');
  });

  it('when the job is no longer active, the task is gone or a field is refused, then it says so plainly', () => {
    expect(partRefusalText(new ApiError({ status: 409, code: 'task_not_open', message: 'That job is not active' }), hammers)).toBe('That task’s job is not active any more. Nothing was logged. Choose another task.');
    expect(partRefusalText(new ApiError({ status: 404, code: 'not_found', message: 'That task was not found' }), hammers)).toBe('That task was not found. Nothing was logged. Close and try again.');
    const field = new ApiError({ status: 400, code: 'validation_failed', message: 'Invalid', fields: { partId: ['There is no such part'] } });
    expect(partRefusalText(field, hammers)).toBe('There is no such part. Nothing was logged.');
  });

  it('when the network is down, then it says nothing was logged and to try again later', () => {
    expect(partRefusalText(new ApiError({ status: 0, code: 'network_error', message: 'x' }), hammers)).toBe('No network, so nothing was logged. Try again when the network is back.');
  });
});

describe('isWhoRefusal', () => {
  it('when the PIN or the screen is refused, then the panel treats it like a clock action’s refusal; a stock refusal is about the part', () => {
    expect(isWhoRefusal(new ApiError({ status: 403, code: 'pin_incorrect', message: 'x' }))).toBe(true);
    expect(isWhoRefusal(new ApiError({ status: 401, code: 'wall_not_paired', message: 'x' }))).toBe(true);
    expect(isWhoRefusal(new ApiError({ status: 409, code: 'insufficient_stock', message: 'x' }))).toBe(false);
    expect(isWhoRefusal(new Error('x'))).toBe(false);
  });
});
