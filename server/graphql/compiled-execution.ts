import type { DocumentNode, ExecutionArgs, ExecutionResult } from 'graphql';
import type { CompiledQuery } from 'graphql-jit';

// Each validated document is compiled once into a plain function (graphql-jit) and run as that; the
// interpreter walks the schema again on every request. Kept per document tree, which the document
// cache shares between requests; a tree that is dropped takes its compiled forms with it.
export function compiledExecution(): (args: ExecutionArgs) => Promise<ExecutionResult> | ExecutionResult {
  const compiled = new WeakMap<DocumentNode, Map<string, CompiledQuery | ExecutionResult>>();
  // Loaded on the first request, not at start: graphql-jit and its JSON compiler take ~0.25 s to load.
  let jit: typeof import('graphql-jit') | undefined;
  return async (args) => {
    jit ??= await import('graphql-jit');
    const { compileQuery, isCompiledQuery } = jit;
    let byOperation = compiled.get(args.document);
    if (!byOperation) compiled.set(args.document, (byOperation = new Map()));
    const name = args.operationName ?? '';
    let query = byOperation.get(name);
    if (!query) byOperation.set(name, (query = compileQuery(args.schema, args.document, args.operationName ?? undefined)));
    if (!isCompiledQuery(query)) return query;
    return query.query(args.rootValue, args.contextValue, args.variableValues ?? {}) as Promise<ExecutionResult> | ExecutionResult;
  };
}
