import type { z } from 'zod';
import { ValidationError } from './errors.js';

/**
 * Parses request input with a zod schema; on failure throws a ValidationError naming the first
 * bad field and listing every bad field in `fields`.
 * @param schema - the zod schema
 * @param input - `req.body` or `req.query`
 * @returns the parsed, typed value
 * @example
 * const { name } = inputParse(workspaceCreateSchema, req.body);
 */
export function inputParse<T extends z.ZodType>(schema: T, input: unknown): z.infer<T> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const fields: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const key = issue.path.length > 0 ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  const [first] = Object.keys(fields);
  const message = first === '_' ? fields[first] : `${first}: ${fields[first]}`;
  throw new ValidationError(message, first === '_' ? undefined : first, fields);
}
