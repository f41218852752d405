import { z } from 'zod';

// The one error body of the API: RFC 9457 problem details plus our `code` and the field at fault.

export const problemCodes = [
  'validation_failed',
  'malformed_json',
  'payload_too_large',
  'unauthenticated',
  'invalid_credentials',
  'token_expired',
  'forbidden',
  'not_found',
  'conflict',
  'last_owner',
  'in_use',
  'stale_version',
  'rate_limited',
  'internal',
] as const;
export type ProblemCode = (typeof problemCodes)[number];

export const problemResponse = z.object({
  type: z.string(),
  status: z.number().int(),
  title: z.string(),
  code: z.enum(problemCodes),
  message: z.string(),
  /** Dotted path of the one input field at fault, when there is one. */
  field: z.string().optional(),
  /** For `in_use`: the studies that hold on to the thing that could not be deleted. */
  usedBy: z.array(z.object({ id: z.string(), name: z.string() })).optional(),
  /** For `stale_version`: the version now stored (the client sent an older one). */
  currentVersion: z.number().int().optional(),
});
export type ProblemResponse = z.infer<typeof problemResponse>;
