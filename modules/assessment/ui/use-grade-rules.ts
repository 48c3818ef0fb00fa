import { useEffect } from 'react';
import { useQuery } from 'urql';

import { withFragments } from '@/modules/api/ui/document';
import type { GradeRulesQuery } from '@/modules/api/ui/graphql-types';
import { GRADE_RULE_FIELDS } from '@/modules/api/ui/table-fragments';
import { completeRules, defaultRules, type GradeRules } from '@/modules/assessment/core/grade-rules';

export const GRADE_RULES_QUERY = withFragments(/* GraphQL */ `query GradeRules { gradeRules { ...GradeRuleFields } }`, GRADE_RULE_FIELDS);

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
  const [result] = useQuery<GradeRulesQuery>({ query: GRADE_RULES_QUERY, requestPolicy: 'cache-and-network' });
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
