/** Longest coil name the library takes (coils-dto's coilName). */
const MAX_NAME = 80;

/**
 * The first free copy name for `name`: "<name> (copy)", then "<name> (copy 2)", "(copy 3)" …
 * Names are compared case-insensitively, as the search does. The original is shortened (with an
 * ellipsis) when the suffix would push the name past the 80-character limit.
 */
export function copyName(name: string, taken: Iterable<string>): string {
  const used = new Set([...taken].map((n) => n.toLowerCase()));
  for (let n = 1; ; n++) {
    const suffix = n === 1 ? ' (copy)' : ` (copy ${n})`;
    const room = MAX_NAME - suffix.length;
    const base = name.length <= room ? name : `${name.slice(0, room - 1).trimEnd()}…`;
    const candidate = `${base}${suffix}`;
    if (!used.has(candidate.toLowerCase())) return candidate;
  }
}
