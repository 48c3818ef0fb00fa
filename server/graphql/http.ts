import { maxAliasesRule } from '@escape.tech/graphql-armor-max-aliases';
import { maxDepthRule } from '@escape.tech/graphql-armor-max-depth';
import { maxDirectivesRule } from '@escape.tech/graphql-armor-max-directives';
import type { NextFunction, Request, Response } from 'express';
import {
  getNamedType,
  getNullableType,
  GraphQLError,
  isCompositeType,
  isListType,
  parse,
  specifiedRules,
  validate,
  visit,
  type DocumentNode,
  type GraphQLSchema,
  type ValidationContext,
  type ValidationRule,
} from 'graphql';
import { createHandler, type HandlerOptions, type OperationContext } from 'graphql-http';
import { createComplexityRule, type ComplexityEstimator } from 'graphql-query-complexity';

import { documentCache } from './document-cache';
import { DEFAULT_PAGE_SIZE, MAX_QUERY_DEPTH, NESTED_LIST_ROWS, QUERY_LIMITS, ROOT_FIELD_COST } from './limits';

const limitError = (message: string) => new GraphQLError(message, { extensions: { code: 'BAD_INPUT' } });
// graphql-armor words its refusals as syntax errors; they are limits, said as such.
const report = (ctx: ValidationContext | null, err: GraphQLError) => ctx?.reportError(limitError(err.message.replace(/^Syntax Error: /, '')));
const armor = { propagateOnRejection: false, onReject: [report] };
const depthRefusal = (message: string) => ({ propagateOnRejection: false, onReject: [(ctx: ValidationContext | null) => ctx?.reportError(limitError(message))] });

function rowsOf(args: Record<string, unknown>, root: boolean, declared: unknown): number {
  if (typeof args.limit === 'number') return Math.max(1, args.limit);
  // A hand-written list that returns a bounded number of rows says so in its extensions.
  if (typeof declared === 'number') return declared;
  const range = args.range;
  if (Array.isArray(range) && range.length === 2 && typeof range[0] === 'number' && typeof range[1] === 'number') return Math.max(1, range[1] - range[0] + 1);
  return root ? DEFAULT_PAGE_SIZE : NESTED_LIST_ROWS;
}

// A field costs 1 (a top-level one 10); a list of records costs its rows times what each row asks for.
const estimateCost: ComplexityEstimator = ({ type, field, args, childComplexity }) => {
  const root = type.name === 'Query' || type.name === 'Mutation';
  const base = root ? ROOT_FIELD_COST : 1;
  const introspection = type.name.startsWith('__') || field.name.startsWith('__');
  if (!introspection && isListType(getNullableType(field.type)) && isCompositeType(getNamedType(field.type))) {
    // A list inside a hand-written answer (a grade's findings) comes with its row: counted once unless it says.
    const rows = root || field.extensions?.relation ? rowsOf(args, root, field.extensions?.maxRows) : typeof field.extensions?.maxRows === 'number' ? field.extensions.maxRows : 1;
    return base + rows * Math.max(1, childComplexity);
  }
  return base + childComplexity;
};

const MAX_RULE_SETS_PER_DOCUMENT = 64;
const ROW_ARGUMENTS = new Set(['limit', 'range']);
const rowVariableNames = new WeakMap<DocumentNode, string[]>();

/** The variables a document passes as the rows it asks for: the only ones its estimated cost reads. */
function rowVariables(document: DocumentNode): string[] {
  let names = rowVariableNames.get(document);
  if (!names) {
    const found = new Set<string>();
    visit(document, {
      Argument(node) {
        if (!ROW_ARGUMENTS.has(node.name.value)) return;
        visit(node.value, { Variable: (v) => void found.add(v.name.value) });
      },
    });
    rowVariableNames.set(document, (names = [...found].sort()));
  }
  return names;
}

function limitRules(variables: Record<string, unknown> | undefined): ValidationRule[] {
  return [
    maxAliasesRule({ n: QUERY_LIMITS.aliases, ...armor }),
    maxDirectivesRule({ n: QUERY_LIMITS.directives, ...armor }),
    // graphql-armor counts the top field as level 1; MAX_QUERY_DEPTH counts the levels below it.
    maxDepthRule({ n: MAX_QUERY_DEPTH + 1, ignoreIntrospection: true, flattenFragments: true, ...depthRefusal(`The query nests deeper than ${MAX_QUERY_DEPTH} levels below its top field.`) }),
    maxDepthRule({ n: QUERY_LIMITS.introspectionDepth + 1, ignoreIntrospection: false, flattenFragments: true, ...depthRefusal(`The query nests deeper than ${QUERY_LIMITS.introspectionDepth} levels below its top field (introspection included).`) }),
    createComplexityRule({
      maximumComplexity: QUERY_LIMITS.cost,
      variables,
      estimators: [estimateCost],
      createError: (max, actual) => limitError(`The query asks for too much at once: its estimated cost is ${actual}, at most ${max} is served. Ask for fewer rows or fields.`),
    }),
  ];
}

/**
 * graphql-js's own rules first, fragment cycles among them: the limit rules walk fragments and would
 * recurse forever through a cycle, so they run only on a document that is otherwise valid.
 */
function validateInOrder(schema: GraphQLSchema, document: DocumentNode, rules: readonly ValidationRule[] = [], checkSpecified = (d: DocumentNode) => validate(schema, d, specifiedRules)): readonly GraphQLError[] {
  const invalid = checkSpecified(document);
  if (invalid.length) return invalid;
  try {
    return validate(schema, document, rules.filter((r) => !specifiedRules.includes(r)));
  } catch (err) {
    // graphql-query-complexity throws past its node budget.
    if (err instanceof GraphQLError) return [limitError(err.message)];
    throw err;
  }
}

/** Every check a document meets before it runs: the one used by the route, for scripts and tests too. */
export function validateDocument(schema: GraphQLSchema, document: DocumentNode, variables?: Record<string, unknown>): readonly GraphQLError[] {
  return validateInOrder(schema, document, limitRules(variables));
}

export function parseDocument(source: string): DocumentNode {
  try {
    return parse(source, { maxTokens: QUERY_LIMITS.tokens });
  } catch (err) {
    if (err instanceof GraphQLError && /contains more tha[nt] \d+ tokens/.test(err.message)) {
      throw limitError(`The query is too long: at most ${QUERY_LIMITS.tokens} tokens (names, values, punctuation) are read.`);
    }
    throw err;
  }
}

interface GraphRouteOptions<Context extends OperationContext> {
  schema: GraphQLSchema;
  context: (req: Request) => Context;
  formatError: (err: Readonly<GraphQLError | Error>) => GraphQLError;
  execute?: HandlerOptions<Request, undefined, Context>['execute'];
  onOperation?: HandlerOptions<Request, undefined, Context>['onOperation'];
}

const refusal = (message: string) => JSON.stringify({ errors: [{ message, extensions: { code: 'BAD_INPUT' } }] });
const NO_BODY: Record<number, string> = {
  405: 'GraphQL takes GET for queries and POST for everything.',
  406: 'GraphQL answers application/json or application/graphql-response+json: accept one of them.',
  415: 'Send GraphQL as JSON (Content-Type: application/json).',
};

/** POST /graphql (and GET for queries) through graphql-http, with every refusal a 4xx and a message. */
export function graphqlRoute<Context extends OperationContext>(opts: GraphRouteOptions<Context>) {
  // The screens send the same few documents again and again: each is parsed and meets graphql-js's own
  // rules once; the limits run on every request, since the cost depends on the variables.
  const cache = documentCache(undefined, parseDocument);
  const checkSpecified = (document: DocumentNode) => cache.validate(opts.schema, document, specifiedRules);
  // The limits depend on the variables only through the rows asked for: one set of rules, and one
  // answer, per document and those values.
  const ruleSets = new WeakMap<DocumentNode, Map<string, ValidationRule[]>>();
  const answers = new WeakMap<readonly ValidationRule[], readonly GraphQLError[]>();
  const rulesFor = (document: DocumentNode, variables: Record<string, unknown> | undefined) => {
    let sets = ruleSets.get(document);
    if (!sets) ruleSets.set(document, (sets = new Map()));
    const key = JSON.stringify(rowVariables(document).map((name) => variables?.[name] ?? null));
    let rules = sets.get(key);
    if (!rules) {
      if (sets.size >= MAX_RULE_SETS_PER_DOCUMENT) sets.clear();
      sets.set(key, (rules = limitRules(variables)));
    }
    return rules;
  };
  const handle = createHandler<Request, undefined, Context>({
    schema: opts.schema,
    context: (req) => opts.context(req.raw),
    parse: (source) => cache.parse(source as string),
    // The rules are chosen here, with the variables the cost depends on; validate below orders them.
    validationRules: (_req, args) => rulesFor(args.document, args.variableValues as Record<string, unknown> | undefined),
    validate: (schema, document, rules) => {
      const known = rules && answers.get(rules);
      if (known) return known;
      const errors = validateInOrder(schema, document, rules, checkSpecified);
      if (rules) answers.set(rules, errors);
      return errors;
    },
    formatError: opts.formatError,
    execute: opts.execute,
    onOperation: opts.onOperation,
  });
  return async (req: Request, res: Response, next: NextFunction) => {
    if (req.method === 'POST' && !req.is('application/json')) {
      res.status(415).type('json').send(refusal(NO_BODY[415]));
      return;
    }
    try {
      const [body, init] = await handle({ url: req.url, method: req.method, headers: req.headers, body: () => (req.body as Record<string, unknown>) ?? null, raw: req, context: undefined });
      let status = init.status;
      let text = body ?? '';
      if (!text && status >= 400) text = refusal(NO_BODY[status] ?? init.statusText ?? 'The GraphQL request was refused.');
      // A document refused before it ran (syntax, validation, limits, variables) answers errors and no data.
      if (status === 200 && text.startsWith('{"errors"') && !('data' in JSON.parse(text))) status = 400;
      res.writeHead(status, { ...init.headers, 'content-type': init.headers?.['content-type'] ?? 'application/json; charset=utf-8' }).end(text);
    } catch (err) {
      next(err);
    }
  };
}
