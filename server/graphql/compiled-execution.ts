import { compileQuery, isCompiledQuery, type CompiledQuery } from 'graphql-jit';
import type { DocumentNode, ExecutionArgs, ExecutionResult } from 'graphql';

// Each validated document is compiled once into a plain function (graphql-jit) and run as that; the
// interpreter walks the schema again on every request. Kept per document tree, which the document
// cache shares between requests; a tree that is dropped takes its compiled forms with it.
export function compiledExecution(): (args: ExecutionArgs) => Promise<ExecutionResult> | ExecutionResult {
  const compiled = new WeakMap<DocumentNode, Map<string, CompiledQuery | ExecutionResult>>();
  return (args) => {
    let byOperation = compiled.get(args.document);
    if (!byOperation) compiled.set(args.document, (byOperation = new Map()));
    const name = args.operationName ?? '';
    let query = byOperation.get(name);
    if (!query) byOperation.set(name, (query = compileQuery(args.schema, args.document, args.operationName ?? undefined)));
    if (!isCompiledQuery(query)) return query;
    return query.query(args.rootValue, args.contextValue, args.variableValues ?? {}) as Promise<ExecutionResult> | ExecutionResult;
  };
}
