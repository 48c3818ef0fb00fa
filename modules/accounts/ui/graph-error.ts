import type { CombinedError } from '@urql/core';

export type GraphErrorCode = 'BAD_INPUT' | 'NOT_ALLOWED' | 'NOT_FOUND' | 'CONFLICT' | 'UNAUTHENTICATED' | 'INTERNAL';

export interface GraphProblem {
  message: string;
  code?: GraphErrorCode;
  /** the input field the server blames, when it names one */
  field?: string;
}

/** The first problem of a failed request, in words for a person. */
export function graphProblem(error: CombinedError | undefined | null): GraphProblem | null {
  if (!error) return null;
  if (error.networkError) return { message: 'The server cannot be reached. Check the connection and try again.' };
  const first = error.graphQLErrors[0];
  if (!first) return { message: error.message };
  const ext = (first.extensions ?? {}) as { code?: GraphErrorCode; field?: string };
  return { message: first.message, code: ext.code, field: ext.field };
}

/** The server says "maker: is required"; beside the field, "is required" is enough for the form to word. */
export function problemWithoutField(problem: GraphProblem): string {
  return problem.field && problem.message.startsWith(`${problem.field}: `) ? problem.message.slice(problem.field.length + 2) : problem.message;
}
