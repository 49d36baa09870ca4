/** The time now, injectable so that scheduled work can be tested on a chosen date. */
export interface Clock {
  now(): Date;
}

export const CLOCK = Symbol('CLOCK');

export const systemClock: Clock = { now: () => new Date() };
