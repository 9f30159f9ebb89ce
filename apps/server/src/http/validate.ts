import type { Request } from 'express';
import { z } from 'zod';
import { HttpError } from './errors';

/** One problem with a request, named by where it is (`body.spec`, `query.limit`, `params.id`). */
export interface FieldProblem {
  field: string;
  message: string;
}

function problemsOf(where: string, error: z.ZodError): FieldProblem[] {
  return error.issues.map((i) => ({ field: [where, ...i.path.map(String)].join('.'), message: i.message }));
}

/** Parses one part of a request against its schema; a 400 names every field that is wrong and why. */
export function parseRequest<S extends z.ZodType>(where: 'body' | 'query' | 'params', schema: S, value: unknown): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const problems = problemsOf(where, parsed.error);
  const first = problems[0]!;
  throw new HttpError(400, 'invalid_request', `${first.field}: ${first.message}`, { problems });
}

export const parseBody = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => parseRequest('body', schema, req.body ?? {});
export const parseQuery = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => parseRequest('query', schema, req.query);
export const parseParams = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => parseRequest('params', schema, req.params);
