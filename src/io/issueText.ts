// Wording of the schema problems no rule words itself (a field missing, or of the wrong kind):
// "missing", "must be an object", … after the field's path. Used for every parse of a case or
// plan file, so no message falls back to the library's generic text.
import type { z } from 'zod';

const KIND: Record<string, string> = {
  object: 'an object',
  array: 'a list',
  number: 'a number',
  string: 'text',
  boolean: 'true or false',
};

/** A per-parse error map: our words for a wrong or missing value, the rules' own words otherwise. */
export const issueText: z.core.$ZodErrorMap = (iss) => {
  if (iss.code !== 'invalid_type') return undefined;
  if (iss.input === undefined) return 'missing';
  return `must be ${KIND[iss.expected] ?? iss.expected}`;
};
