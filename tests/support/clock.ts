import type { Clock } from '@/server/clock';

/** The real time plus an offset a test moves on by hand. */
export interface TestClock extends Clock {
  /** Moves the clock on by `ms` and returns the new time. */
  advance: (ms: number) => Date;
}

export function testClock(): TestClock {
  let offset = 0;
  const now = () => new Date(Date.now() + offset);
  return {
    now,
    advance: (ms) => {
      offset += ms;
      return now();
    },
  };
}
