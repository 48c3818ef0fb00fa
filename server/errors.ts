import { GraphQLError } from 'graphql';
import {
  CheckViolationError,
  DataError,
  ForeignKeyViolationError,
  NotFoundError as ObjectionNotFoundError,
  NotNullViolationError,
  UniqueViolationError,
  ValidationError,
} from 'objection';
import { ZodError } from 'zod';

// The few kinds of failure a client is told about; everything else is an internal error.
export type ErrorCode = 'BAD_INPUT' | 'NOT_ALLOWED' | 'NOT_FOUND' | 'CONFLICT' | 'UNAUTHENTICATED' | 'TOO_LARGE' | 'UNSUPPORTED_TYPE' | 'INTERNAL';

const STATUS: Record<ErrorCode, number> = {
  BAD_INPUT: 400,
  UNAUTHENTICATED: 401,
  NOT_ALLOWED: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  TOO_LARGE: 413,
  UNSUPPORTED_TYPE: 415,
  INTERNAL: 500,
};

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly field?: string,
  ) {
    super(message);
  }

  get status(): number {
    return STATUS[this.code];
  }
}

export const notAllowed = (what = 'do this') => new AppError('NOT_ALLOWED', `Not allowed: your role cannot ${what}.`);
export const notFound = (what: string) => new AppError('NOT_FOUND', `Not found: ${what}.`);
export const badInput = (field: string, problem: string) => new AppError('BAD_INPUT', `${field}: ${problem}`, field);

function constraintField(err: { constraint?: string; columns?: string[]; column?: string }): string | undefined {
  return err.columns?.[0] ?? err.column ?? err.constraint;
}

// One place turns any thrown thing into an AppError a client may see.
export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) {
    const issue = err.issues[0];
    const field = issue.path.join('.') || 'input';
    return badInput(field, issue.message);
  }
  if (err instanceof ValidationError) {
    const data = err.data as Record<string, { message: string }[]> | undefined;
    const field = data ? Object.keys(data)[0] : 'input';
    const message = data?.[field]?.[0]?.message ?? err.message;
    return badInput(field, message);
  }
  if (err instanceof ObjectionNotFoundError) return notFound('no such record');
  if (err instanceof UniqueViolationError) {
    const field = constraintField(err) ?? 'value';
    return new AppError('CONFLICT', `${field}: already in use`, field);
  }
  if (err instanceof CheckViolationError || err instanceof NotNullViolationError || err instanceof ForeignKeyViolationError) {
    const field = constraintField(err as never) ?? 'input';
    return badInput(field, 'is not an accepted value');
  }
  // A value PostgreSQL cannot take (out of range, malformed, a NUL byte) that no schema caught first.
  if (err instanceof DataError) return badInput('input', 'a value is out of range or not in an accepted form');
  return new AppError('INTERNAL', 'Something went wrong on the server.');
}

export function toGraphQLError(err: unknown): GraphQLError {
  const app = toAppError(err);
  if (app.code === 'INTERNAL') console.error(err);
  return new GraphQLError(app.message, { extensions: { code: app.code, ...(app.field ? { field: app.field } : {}) } });
}
