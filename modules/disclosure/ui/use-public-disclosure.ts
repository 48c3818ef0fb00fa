import { useCallback, useEffect, useState } from 'react';

import { fetchDisclosure, type Loaded, type PublicDisclosure } from './public-disclosure';

/**
 * The public disclosure behind a link (the newest version, or `version`). A reload keeps the
 * current answer on screen until the new one arrives; another link or version starts afresh.
 */
export function usePublicDisclosure(token: string | null, version: number | null) {
  const key = token ? `${token}@${version ?? 'newest'}` : null;
  const [answer, setAnswer] = useState<{ key: string; value: Loaded<PublicDisclosure> } | null>(null);
  const [round, setRound] = useState(0);

  useEffect(() => {
    if (!token || !key) return;
    let live = true;
    fetchDisclosure(token, version).then((value) => {
      if (live) setAnswer({ key, value });
    });
    return () => {
      live = false;
    };
  }, [token, version, key, round]);

  const reload = useCallback(() => setRound((r) => r + 1), []);
  return { result: answer && answer.key === key ? answer.value : null, reload };
}
