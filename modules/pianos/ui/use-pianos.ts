import { useQuery } from 'urql';

import { STAGES, type PianoKind, type Stage } from '@/modules/pianos/core/piano';

export const PAGE_SIZE = 50;

export const PIANO_FIELDS = 'id stockNumber maker model serialNumber year yearIsEstimate kind sizeCm finish stage stageChangedAt createdAt updatedAt';

export interface PianoRecord {
  id: number;
  stockNumber: string;
  maker: string;
  model: string | null;
  serialNumber: string | null;
  year: number | null;
  yearIsEstimate: boolean;
  kind: PianoKind;
  sizeCm: number | null;
  finish: string | null;
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

// The generated limit and offset arguments are typed [Int]; a literal number fits that and a plain Int alike.
function pageArg(name: 'limit' | 'offset', value: number): string {
  if (!Number.isInteger(value) || value < 0) throw new Error(`bad ${name} ${value}`);
  return `${name}: ${value}`;
}

export function pianoListQuery(stage: Stage | null | undefined, order: PianoOrder, limit = PAGE_SIZE, offset = 0): string {
  return `query Pianos($maker: String) {
    pianos(${pageArg('limit', limit)}, ${pageArg('offset', offset)}, makerLikeNoCase: $maker, ${ORDER_ARGS[order]}${stageArg(stage)}) { ${PIANO_FIELDS} }
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
    query: pianoListQuery(stage, order, limit, offset),
    variables: { maker: makerTerm ? `%${makerTerm}%` : undefined },
    context: LIST_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  return { pianos: result.data?.pianos ?? null, fetching: result.fetching, error: result.error, reexecute };
}

// One aliased list per stage; ids only. The server's page cap (200) bounds each count.
export const COUNT_CAP = 200;
export const COUNTS_QUERY = `query StageCounts {
  ${STAGES.map((stage) => `${stage}: pianos(stageEq: ${stage}, limit: ${COUNT_CAP}) { id }`).join('\n  ')}
}`;

export function useStageCounts() {
  const [result] = useQuery<Record<Stage, { id: number }[]>>({ query: COUNTS_QUERY, context: LIST_CONTEXT, requestPolicy: 'cache-and-network' });
  const counts = result.data ? (Object.fromEntries(STAGES.map((s) => [s, result.data![s]?.length ?? 0])) as Record<Stage, number>) : null;
  return { counts, fetching: result.fetching, error: result.error };
}
