// What each main screen asks the server, taken from the screens' own hooks, so the bench and the
// statement-count tests send exactly what a browser sends.
import { COUNTS_QUERY, PAGE_SIZE, PIANOS_QUERY, pianoListVariables } from '@/modules/pianos/ui/use-pianos';
import { PIANO_QUERY } from '@/modules/pianos/ui/use-piano';
import { disclosureApi } from '@/modules/disclosure/ui/public-disclosure';
import { OVERRUNS_PAGE, OVERRUNS_QUERY } from '@/modules/shop/ui/use-overruns';
import { WORK_PLAN_QUERY } from '@/modules/shop/ui/use-work-plan';
import { FIRST_QUEUE_VARIABLES, WORK_QUEUE_QUERY } from '@/modules/shop/ui/use-work-queue';
import { FIRST_STOCK_VARIABLES, STOCK_CHARTS_QUERY, STOCK_TABLE_QUERY } from '@/modules/pricing/ui/use-stock-table';

export interface ScreenRequest {
  name: string;
  method: 'GET' | 'POST';
  path: string;
  headers: Record<string, string>;
  body?: string;
}

export interface GraphDocument {
  name: string;
  role: 'manager' | 'technician';
  query: string;
  variables?: Record<string, unknown>;
}

export interface Targets {
  /** A piano in the workshop, with a plan, an assessment and a history. */
  pianoId: number;
  /** The public link of a piano on the floor. */
  disclosureToken: string;
}

// The heaviest sort: every filtered piano's money summed before the page is cut.
export const STOCK_BY_MARGIN = { query: { stages: ['assessed', 'in_workshop', 'ready', 'on_floor', 'held'], sort: 'margin', descending: false, limit: 25, offset: 0 } };
/** The stock table's CSV of every piano on hand, sorted by margin. */
export const STOCK_EXPORT_PATH = '/api/stock/export.csv?stages=assessed,in_workshop,ready,on_floor,held&sort=margin';

/** The GraphQL documents of the main screens, with the variables the screens send. */
export function screenDocuments(t: Targets): GraphDocument[] {
  return [
    { name: 'stock list', role: 'manager', query: PIANOS_QUERY, variables: pianoListVariables({ order: 'newest', limit: PAGE_SIZE, offset: 0 }) },
    { name: 'piano page', role: 'manager', query: PIANO_QUERY, variables: { id: t.pianoId } },
    { name: 'bench queue (technician)', role: 'technician', query: WORK_QUEUE_QUERY, variables: FIRST_QUEUE_VARIABLES },
    { name: 'bench queue (manager)', role: 'manager', query: WORK_QUEUE_QUERY, variables: FIRST_QUEUE_VARIABLES },
    { name: 'work plan', role: 'manager', query: WORK_PLAN_QUERY, variables: { pianoId: t.pianoId } },
    { name: 'overruns', role: 'manager', query: OVERRUNS_QUERY, variables: { limit: OVERRUNS_PAGE, offset: 0 } },
    { name: 'stage counts', role: 'manager', query: COUNTS_QUERY },
    { name: 'stock table', role: 'manager', query: STOCK_TABLE_QUERY, variables: FIRST_STOCK_VARIABLES },
    { name: 'stock table by margin, on hand', role: 'manager', query: STOCK_TABLE_QUERY, variables: STOCK_BY_MARGIN },
    { name: 'stock table, a search', role: 'manager', query: STOCK_TABLE_QUERY, variables: { query: { ...FIRST_STOCK_VARIABLES.query, search: 'FW-00' } } },
    { name: 'stock charts', role: 'manager', query: STOCK_CHARTS_QUERY },
  ];
}

/** The public disclosure page's one request, as the buyer's phone sends it. */
export const publicDisclosurePath = (token: string) => disclosureApi(token);

const json = (token: string) => ({ 'content-type': 'application/json', accept: 'application/json', authorization: `Bearer ${token}` });

export function screenRequests(tokens: Record<GraphDocument['role'], string>, t: Targets): { screens: ScreenRequest[]; stockGraphql: ScreenRequest; stockPlain: ScreenRequest } {
  const graph = screenDocuments(t).map<ScreenRequest>((d) => ({ name: d.name, method: 'POST', path: '/graphql', headers: json(tokens[d.role]), body: JSON.stringify({ query: d.query, variables: d.variables }) }));
  const disclosure: ScreenRequest = { name: 'public disclosure', method: 'GET', path: publicDisclosurePath(t.disclosureToken), headers: { accept: 'application/json' } };
  const csv: ScreenRequest = { name: 'stock table CSV, on hand', method: 'GET', path: STOCK_EXPORT_PATH, headers: { authorization: `Bearer ${tokens.manager}` } };
  const stockGraphql = graph[0];
  return { screens: [...graph, disclosure, csv], stockGraphql, stockPlain: { ...stockGraphql, name: 'stock list (plain route)', path: '/__bench/stock' } };
}
