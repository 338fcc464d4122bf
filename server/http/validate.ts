// zod at the edge: every body, query and param goes through parse() before a use-case sees it.
import type { z } from 'zod';
import { AppError } from './errors';

/** Parses `value` or throws a 400 invalid_input naming each bad field and why. */
export function parse<S extends z.ZodType>(schema: S, value: unknown, what = 'request body'): z.output<S> {
  if (value === undefined && what === 'request body') {
    throw new AppError('invalid_input', 400, 'The request body must be a JSON object (Content-Type: application/json)');
  }
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const fields: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  const detail = Object.entries(fields)
    .map(([k, m]) => (k === '_' ? m : `${k}: ${m}`))
    .join('; ');
  throw new AppError('invalid_input', 400, `Invalid ${what}: ${detail}`, fields);
}
