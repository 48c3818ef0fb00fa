import { useCallback } from 'react';
import { useQuery } from 'urql';

import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';
import { withFragments } from '@/modules/api/ui/document';
import type { GradeRulesQuery, SetGradeRulesMutation, SetGradeRulesMutationVariables } from '@/modules/api/ui/graphql-types';
import { GRADE_RULE_FIELDS } from '@/modules/api/ui/table-fragments';

import { GRADE_RULES_QUERY } from './use-grade-rules';

export type { MutationOutcome } from '@/modules/accounts/ui/use-guarded-mutation';

// The query and the save share this name so a save asks again.
const RULES_TYPENAMES = ['GradeRules'];
const RULES_CONTEXT = { additionalTypenames: RULES_TYPENAMES };

/** The grading rules in force, straight from the server (the editor never works from a cached copy). */
export function useGradeRulesInForce() {
  const [result, reexecute] = useQuery<GradeRulesQuery>({ query: GRADE_RULES_QUERY, context: RULES_CONTEXT, requestPolicy: 'network-only' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { rules: result.data?.gradeRules ?? null, error: result.error, refresh };
}

/** Saves the manager's rules; the server answers with them under their new version. */
export function useSaveGradeRules() {
  return useGuardedMutation<SetGradeRulesMutation['setGradeRules'], SetGradeRulesMutationVariables>(
    withFragments(/* GraphQL */ `mutation SetGradeRules($r: GradeRulesInput!) { setGradeRules(rules: $r) { ...GradeRuleFields } }`, GRADE_RULE_FIELDS),
    'setGradeRules',
    RULES_TYPENAMES,
    'Still saving the last change: wait a moment.',
  );
}
