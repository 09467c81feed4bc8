import { describe, expect, it } from 'vitest';
import { cardHours, cardMargin } from './card-hours';

describe('cardHours', () => {
  it('when 3 h 20 min of a 6 h estimate are used, then "3:20 of 6:00", the bar a little over half full, nothing flagged', () => {
    expect(cardHours(360, 200)).toEqual({
      text: '3:20 of 6:00',
      note: null,
      label: 'Hours: 3 hours 20 minutes used of 6 hours estimated',
      fill: 200 / 360,
      isOver: false,
    });
  });

  it('when exactly the estimate is used, then it is not over', () => {
    expect(cardHours(90, 90)).toMatchObject({ text: '1:30 of 1:30', note: null, fill: 1, isOver: false });
  });

  it('when 7 h 10 min of a 6 h estimate are used, then the card says "1:10 over" in words and the name says by how much', () => {
    expect(cardHours(360, 430)).toEqual({
      text: '7:10 of 6:00',
      note: '1:10 over',
      label: 'Hours: 7 hours 10 minutes used of 6 hours estimated, 1 hour 10 minutes over the estimate',
      fill: 1,
      isOver: true,
    });
  });

  it('when nothing is estimated, then the logged time shows with "no estimate", not as over', () => {
    expect(cardHours(0, 95)).toEqual({ text: '1:35', note: 'no estimate', label: 'Hours: 1 hour 35 minutes used, no estimate', fill: 0, isOver: false });
    expect(cardHours(0, 0)).toMatchObject({ text: '0:00', note: 'no estimate', label: 'Hours: 0 minutes used, no estimate' });
  });

  it('when an estimate has no time logged yet, then "0:00 of" it with an empty bar', () => {
    expect(cardHours(960, 0)).toMatchObject({ text: '0:00 of 16:00', fill: 0, isOver: false, label: 'Hours: 0 minutes used of 16 hours estimated' });
  });
});

describe('cardMargin', () => {
  it('when the forecast margin is at or above the target, then only the figure', () => {
    expect(cardMargin(31.25, false)).toEqual({ text: '31.3 % margin', note: null, label: 'Forecast margin 31.3 %' });
  });

  it('when it is below the target, then "low" in words and in the name', () => {
    expect(cardMargin(8.1, true)).toEqual({ text: '8.1 % margin', note: 'low', label: 'Forecast margin 8.1 %, below the target' });
  });
});
