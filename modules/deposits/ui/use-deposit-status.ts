import { useCallback, useEffect, useRef, useState } from 'react';

import type { Loaded } from '@/modules/disclosure/ui/public-disclosure';

import { fetchDepositStatus, type PublicDepositStatus } from './public-deposit';

// The payment's webhook may reach the server a moment after the buyer is sent back: ask again
// every 1.5 s for a minute, then every 5 s, until the payment is no longer pending.
const FAST_MS = 1500;
const SLOW_MS = 5000;
const FAST_FOR_MS = 60_000;

export function useDepositStatus(token: string | null, sessionId: string | null) {
  const [result, setResult] = useState<Loaded<PublicDepositStatus> | null>(null);
  const [waitedLong, setWaitedLong] = useState(false);
  const [round, setRound] = useState(0);
  const started = useRef(0);

  useEffect(() => {
    if (!token || !sessionId) return;
    let live = true;
    let timer: ReturnType<typeof setTimeout> | undefined;
    started.current = Date.now();
    const ask = async () => {
      const answer = await fetchDepositStatus(token, sessionId);
      if (!live) return;
      // A passing network failure keeps the last good answer on screen while polling goes on.
      setResult((previous) => (answer.state === 'error' && previous?.state === 'ok' ? previous : answer));
      const settled = answer.state === 'missing' || (answer.state === 'ok' && answer.data.status !== 'pending');
      if (settled) return;
      const elapsed = Date.now() - started.current;
      setWaitedLong(elapsed > FAST_FOR_MS);
      timer = setTimeout(ask, elapsed > FAST_FOR_MS ? SLOW_MS : FAST_MS);
    };
    ask();
    return () => {
      live = false;
      if (timer) clearTimeout(timer);
    };
  }, [token, sessionId, round]);

  const retry = useCallback(() => setRound((r) => r + 1), []);
  return { result, waitedLong, retry };
}
