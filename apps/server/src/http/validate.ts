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

/**
 * Where a string holds U+0000, which PostgreSQL's text cannot store (it would fail the query with a 500
 * deep in a service); undefined when none does.
 */
function nulCharacterAt(value: unknown, where: string): string | undefined {
  const stack: [unknown, string][] = [[value, where]];
  while (stack.length > 0) {
    const [v, path] = stack.pop()!;
    if (typeof v === 'string') {
      if (v.includes('\u0000')) return path;
    } else if (Array.isArray(v)) {
      for (let i = 0; i < v.length; i++) if (typeof v[i] !== 'number') stack.push([v[i], `${path}.${i}`]);
    } else if (v !== null && typeof v === 'object') {
      for (const [k, inner] of Object.entries(v)) stack.push([inner, `${path}.${k}`]);
    }
  }
  return undefined;
}

/** Parses one part of a request against its schema; a 400 names every field that is wrong and why. */
export function parseRequest<S extends z.ZodType>(where: 'body' | 'query' | 'params', schema: S, value: unknown): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (parsed.success) {
    const nul = nulCharacterAt(parsed.data, where);
    if (nul) throw new HttpError(400, 'invalid_request', `${nul}: a NUL character (U+0000) is not allowed in text`, { problems: [{ field: nul, message: 'contains U+0000' }] });
    return parsed.data;
  }
  const problems = problemsOf(where, parsed.error);
  const first = problems[0]!;
  throw new HttpError(400, 'invalid_request', `${first.field}: ${first.message}`, { problems });
}

export const parseBody = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => parseRequest('body', schema, req.body ?? {});
export const parseQuery = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => parseRequest('query', schema, req.query);
export const parseParams = <S extends z.ZodType>(schema: S, req: Request): z.infer<S> => parseRequest('params', schema, req.params);
