import type { z } from 'zod';
import { ValidationError } from '../errors/app-errors';

type Part = 'body' | 'query' | 'params';

/** Parses one part of a request; the first problem becomes a 400 naming the field at fault. */
export function validate<S extends z.ZodType>(schema: S, value: unknown, part: Part): z.output<S> {
  const result = schema.safeParse(value ?? (part === 'body' ? undefined : {}));
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  if (!issue) throw new ValidationError(`${part}: is invalid`);
  const path = issue.path.map(String);
  if (issue.code === 'unrecognized_keys') {
    const field = [...path, issue.keys[0] ?? ''].join('.');
    throw new ValidationError(`${field}: is not an allowed field`, field);
  }
  if (path.length === 0) {
    const what = part === 'body' ? 'must be a JSON object' : 'is invalid';
    throw new ValidationError(`${part}: ${what}`);
  }
  const field = path.join('.');
  throw new ValidationError(`${field}: ${issue.message}`, field);
}
