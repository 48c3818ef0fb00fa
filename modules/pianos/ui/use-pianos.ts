import { useQuery } from 'urql';

import { STAGES, type PianoFacts, type Stage } from '@/modules/pianos/core/piano';

export const PAGE_SIZE = 50;

export const PIANO_FIELDS = 'id stockNumber maker model serialNumber year yearIsEstimate yearFrom yearTo kind sizeCm finish caseCondition caseNotes stage stageChangedAt createdAt updatedAt';

export interface PianoRecord extends PianoFacts {
  id: number;
  stage: Stage;
  stageChangedAt: string;
  createdAt: string;
  updatedAt: string | null;
}

export type PianoOrder = 'newest' | 'stockNumber' | 'longestInStage';

// Enum arguments of the generated schema have generated type names: they go inline as literals, never as variables.
const ORDER_ARGS: Record<PianoOrder, string> = {
  newest: 'orderByDesc: createdAt',
  stockNumber: 'orderBy: stockNumber',
  longestInStage: 'orderBy: stageChangedAt',
};

function stageArg(stage: Stage | null | undefined): string {
  if (!stage) return '';
  if (!STAGES.includes(stage)) throw new Error(`unknown stage ${stage}`);
  return `, stageEq: ${stage}`;
}

/** The list for a stage and an order; the page (limit, offset) and the maker go as variables. */
export function pianoListQuery(stage: Stage | null | undefined, order: PianoOrder): string {
  return `query Pianos($maker: String, $limit: Int, $offset: Int) {
    pianos(limit: $limit, offset: $offset, makerLikeNoCase: $maker, ${ORDER_ARGS[order]}${stageArg(stage)}) { ${PIANO_FIELDS} }
  }`;
}

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

export function usePianos({ stage, maker, order = 'newest', limit = PAGE_SIZE, offset = 0 }: PianoListFilter) {
  const makerTerm = maker?.trim();
  const [result, reexecute] = useQuery<{ pianos: PianoRecord[] }>({
    query: pianoListQuery(stage, order),
    variables: { maker: makerTerm ? `%${makerTerm}%` : undefined, limit, offset },
    context: LIST_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  return { pianos: result.data?.pianos ?? null, fetching: result.fetching, error: result.error, reexecute };
}

// The server counts every stage in one go, in stage order, with no cap.
export const COUNTS_QUERY = `query StageCounts { stageCounts { stage count } }`;

/** The list cap of PianoListSection: the generated list takes no more than this in one page. */
export const COUNT_CAP = 200;

export function useStageCounts() {
  const [result] = useQuery<{ stageCounts: { stage: Stage; count: number }[] }>({ query: COUNTS_QUERY, context: LIST_CONTEXT, requestPolicy: 'cache-and-network' });
  const rows = result.data?.stageCounts;
  const counts = rows ? (Object.fromEntries(STAGES.map((s) => [s, rows.find((r) => r.stage === s)?.count ?? 0])) as Record<Stage, number>) : null;
  return { counts, fetching: result.fetching, error: result.error };
}
