import { useEffect, useState } from 'react';

/** The time, ticking every `everyMs` while `active` (a running timer); still otherwise. */
export function useNow(active: boolean, everyMs = 1000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!active) return;
    const tick = () => setNow(Date.now());
    // The first tick right away: the clock must not start from the time the page opened.
    const first = setTimeout(tick, 0);
    const id = setInterval(tick, everyMs);
    return () => {
      clearTimeout(first);
      clearInterval(id);
    };
  }, [active, everyMs]);
  return now;
}
