import { useQuery } from 'urql';

import { withFragments } from '@/modules/api/ui/document';
import type { PianoRecordFragment, PianosQuery, PianosQueryVariables, StageCountsQuery } from '@/modules/api/ui/graphql-types';
import { STAGES, type Stage } from '@/modules/pianos/core/piano';

export const PAGE_SIZE = 50;

export const PIANO_RECORD = /* GraphQL */ `
  fragment PianoRecord on Pianos {
    id stockNumber maker model serialNumber year yearIsEstimate yearFrom yearTo kind sizeCm finish caseCondition caseNotes stage stageChangedAt createdAt updatedAt
  }
`;
/** The columns the stock list reads, for the bench's plain route. */
export const PIANO_FIELDS = /\{([^}]*)\}/.exec(PIANO_RECORD)![1].trim().split(/\s+/).join(' ');

export type PianoRecord = PianoRecordFragment;

export type PianoOrder = 'newest' | 'stockNumber' | 'longestInStage';

// One document for every stage and order: absent variables filter and order nothing.
export const PIANOS_QUERY = withFragments(
  /* GraphQL */ `
    query Pianos($stage: PianosStage, $maker: String, $orderBy: PianosOrder, $orderByDesc: PianosOrder, $limit: Int, $offset: Int) {
      pianos(stageEq: $stage, makerLikeNoCase: $maker, orderBy: $orderBy, orderByDesc: $orderByDesc, limit: $limit, offset: $offset) { ...PianoRecord }
    }
  `,
  PIANO_RECORD,
);

const ORDERS: Record<PianoOrder, Pick<PianosQueryVariables, 'orderBy' | 'orderByDesc'>> = {
  newest: { orderByDesc: 'createdAt' },
  stockNumber: { orderBy: 'stockNumber' },
  longestInStage: { orderBy: 'stageChangedAt' },
};

// A list that is empty carries no type name, so tell the cache which type a new piano would add to it
// (the generated schema names the type after the table). A constant: urql compares context by identity.
const LIST_CONTEXT = { additionalTypenames: ['Pianos'] };

export interface PianoListFilter {
  stage?: Stage | null;
  /** part of a maker's name, any case */
  maker?: string;
  order?: PianoOrder;
  limit?: number;
  offset?: number;
}

/** The variables the list sends for a stage, a maker, an order and a page. */
export function pianoListVariables({ stage, maker, order = 'newest', limit = PAGE_SIZE, offset = 0 }: PianoListFilter): PianosQueryVariables {
  if (stage && !STAGES.includes(stage)) throw new Error(`unknown stage ${stage}`);
  const makerTerm = maker?.trim();
  return { ...ORDERS[order], ...(stage ? { stage } : {}), ...(makerTerm ? { maker: `%${makerTerm}%` } : {}), limit, offset };
}

export function usePianos(filter: PianoListFilter) {
  const [result, reexecute] = useQuery<PianosQuery, PianosQueryVariables>({
    query: PIANOS_QUERY,
    variables: pianoListVariables(filter),
    context: LIST_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  return { pianos: result.data?.pianos ?? null, fetching: result.fetching, error: result.error, reexecute };
}

// The server counts every stage in one go, in stage order, with no cap.
export const COUNTS_QUERY = /* GraphQL */ `query StageCounts { stageCounts { stage count } }`;

/** The list cap of PianoListSection: the generated list takes no more than this in one page. */
export const COUNT_CAP = 200;

export function useStageCounts() {
  const [result] = useQuery<StageCountsQuery>({ query: COUNTS_QUERY, context: LIST_CONTEXT, requestPolicy: 'cache-and-network' });
  const rows = result.data?.stageCounts;
  const counts = rows ? (Object.fromEntries(STAGES.map((s) => [s, rows.find((r) => r.stage === s)?.count ?? 0])) as Record<Stage, number>) : null;
  return { counts, fetching: result.fetching, error: result.error };
}
