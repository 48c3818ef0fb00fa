// The time business rules run on (hold ends, reminders); tests pass a clock they move by hand.
export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };
