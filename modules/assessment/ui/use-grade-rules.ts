import { useEffect } from 'react';
import { useQuery } from 'urql';

import { completeRules, defaultRules, type GradeRules } from '@/modules/assessment/core/grade-rules';

export const GRADE_RULES_QUERY = 'query GradeRules { gradeRules }';

const CACHE_KEY = 'feltwire.grade-rules';

function looksLikeRules(value: unknown): value is GradeRules {
  const r = value as Partial<GradeRules> | null;
  return !!r && typeof r.version === 'string' && typeof r.keySidePlayNormalMm === 'number';
}

function cachedRules(): GradeRules | null {
  try {
    const raw = typeof localStorage === 'undefined' ? null : localStorage.getItem(CACHE_KEY);
    const parsed: unknown = raw ? JSON.parse(raw) : null;
    // A copy kept before a rule was added is completed with the shop default for it.
    return looksLikeRules(parsed) ? completeRules(parsed) : null;
  } catch {
    return null;
  }
}

/** The grading rules in force; the last ones seen (or the shop defaults) while they load or when offline. */
export function useGradeRules(): GradeRules {
  const [result] = useQuery<{ gradeRules: unknown }>({ query: GRADE_RULES_QUERY, requestPolicy: 'cache-and-network' });
  const loaded = result.data?.gradeRules;
  useEffect(() => {
    if (!looksLikeRules(loaded)) return;
    try {
      localStorage.setItem(CACHE_KEY, JSON.stringify(loaded));
    } catch {
      // the rules are only a convenience copy
    }
  }, [loaded]);
  if (looksLikeRules(loaded)) return loaded;
  return cachedRules() ?? defaultRules;
}
