import type { z } from 'zod';

/**
 * Turns a zod error into the one-line message Couplet shows for bad input: the path of the
 * first offending field, written `coil.rings[3].r`, then what is wrong and what is allowed.
 *
 * Method: the first issue's path (plus the unknown key for `unrecognized_keys`) is appended to
 * `path`; later issues are only counted, since the first fix often removes the rest.
 *
 * References: none needed.
 *
 * @param error a zod error
 * @param path name of the validated value, e.g. `coil`, `pose`, `pairs[2].tx`
 * @returns a message such as `coil.turns: 0 is out of range; allowed: > 0 and ≤ 1000`
 * @example describeZodError(error, 'pose') // 'pose.tiltX: expected a finite number, …'
 */
export function describeZodError(error: z.ZodError, path: string): string {
  const issue = error.issues[0];
  const at = [...issue.path];
  if (issue.code === 'unrecognized_keys') at.push(...issue.keys.slice(0, 1));
  const field = at.reduce<string>(
    (text, key) => (typeof key === 'number' ? `${text}[${key}]` : `${text}.${String(key)}`),
    path,
  );
  const more = error.issues.length > 1 ? ` (and ${error.issues.length - 1} more)` : '';
  return `${field}: ${issue.message}${more}`;
}
