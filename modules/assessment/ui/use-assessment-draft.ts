import { useCallback, useEffect, useRef, useState } from 'react';

import { readDraft, writeDraft, type AssessmentDraft } from './intake-draft';

type Update = (change: (draft: AssessmentDraft) => AssessmentDraft) => void;

/**
 * The form's draft, kept on the device: restored on load, saved 300 ms after the last change and when
 * the page goes away. Nothing is stored until the user changes something.
 */
export function useAssessmentDraft(storageKey: string, start: () => AssessmentDraft) {
  const [initial] = useState(() => {
    const stored = readDraft(storageKey);
    return { draft: stored ?? start(), restored: stored != null };
  });
  const [draft, setDraft] = useState<AssessmentDraft>(initial.draft);
  const [restored, setRestored] = useState(initial.restored);
  const touched = useRef(initial.restored);
  const latest = useRef(draft);
  useEffect(() => {
    latest.current = draft;
  }, [draft]);

  const update = useCallback<Update>((change) => {
    touched.current = true;
    setRestored(false);
    setDraft((d) => ({ ...change(d), changedAt: new Date().toISOString() }));
  }, []);

  useEffect(() => {
    if (!touched.current) return;
    const timer = setTimeout(() => {
      if (touched.current) writeDraft(storageKey, latest.current);
    }, 300);
    return () => clearTimeout(timer);
  }, [draft, storageKey]);

  // A reload or a closed tab inside the 300 ms still keeps the last keystroke.
  useEffect(() => {
    if (typeof window === 'undefined') return;
    const flush = () => {
      if (touched.current) writeDraft(storageKey, latest.current);
    };
    window.addEventListener('pagehide', flush);
    window.addEventListener('beforeunload', flush);
    return () => {
      window.removeEventListener('pagehide', flush);
      window.removeEventListener('beforeunload', flush);
    };
  }, [storageKey]);

  /** A change that is not the user's (fresh photo links): no "saved at" time, and a restored draft stays restored. */
  const refresh = useCallback<Update>((change) => setDraft((d) => change(d)), []);

  /** Forget the stored draft (sent, or thrown away); `next` starts a fresh one on screen. */
  const forget = useCallback(
    (next?: AssessmentDraft) => {
      touched.current = false;
      writeDraft(storageKey, null);
      if (next) {
        setRestored(false);
        setDraft(next);
      }
    },
    [storageKey],
  );

  return { draft, update, refresh, forget, restored };
}
