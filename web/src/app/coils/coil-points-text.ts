import type { Vec3 } from '../../../../physics/src/index';

export type ParsedPoints = { points: Vec3[] } | { error: string };

const mm = 1e-3;

/**
 * Reads the points of a custom path as the user pasted them: a table with one point per line,
 * `x y z` in millimetres (z may be left out; commas, semicolons or tabs also separate; a header
 * line such as `x y z` is skipped), or JSON in metres as the engine writes it — an array of
 * `{ "x", "y", "z" }` objects or of `[x, y, z]` triples, or an object with a `points` array.
 *
 * @param text what the user pasted
 * @returns the points in metres, or an error naming the line or entry
 * @example parsePointsText('0 0\n10 0\n10 10') // { points: [{x:0,y:0,z:0}, {x:0.01,…}, …] }
 */
export function parsePointsText(text: string): ParsedPoints {
  const trimmed = text.trim();
  if (trimmed === '') return { error: 'Paste the points: one “x y z” line per point, in mm' };
  return trimmed.startsWith('[') || trimmed.startsWith('{')
    ? fromJson(trimmed)
    : fromTable(trimmed);
}

/** Writes points (m) as the table the field shows: one `x y z` line per point, in mm. */
export function pointsText(points: Vec3[]): string {
  const show = (metres: number) => String(Number((metres / mm).toPrecision(9)));
  return points.map((p) => `${show(p.x)} ${show(p.y)} ${show(p.z)}`).join('\n');
}

function fromTable(text: string): ParsedPoints {
  const points: Vec3[] = [];
  const lines = text.split(/\r?\n/);
  for (const [index, raw] of lines.entries()) {
    const line = raw.trim();
    if (line === '' || line.startsWith('#')) continue;
    const cells = line.split(/[\s,;]+/).filter((cell) => cell !== '');
    const numbers = cells.map(Number);
    if (numbers.some((n) => !Number.isFinite(n))) {
      // A header line ("x y z", "x_mm; y_mm") before the first point is not data.
      if (points.length === 0 && cells.every((cell) => /^[a-z_()[\]]+$/i.test(cell))) continue;
      return {
        error: `Line ${index + 1}: “${line.slice(0, 40)}” is not 2 or 3 numbers (x y z, mm)`,
      };
    }
    if (numbers.length < 2 || numbers.length > 3) {
      return { error: `Line ${index + 1}: ${numbers.length} numbers; expected x y or x y z (mm)` };
    }
    const [x, y, z = 0] = numbers;
    points.push({ x: x * mm, y: y * mm, z: z * mm });
  }
  return { points };
}

function fromJson(text: string): ParsedPoints {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    return { error: 'Not valid JSON: expected [{"x": …, "y": …, "z": …}, …] in metres' };
  }
  const list =
    typeof json === 'object' && json !== null && !Array.isArray(json)
      ? (json as { points?: unknown }).points
      : json;
  if (!Array.isArray(list)) return { error: 'JSON without a list of points' };
  const points: Vec3[] = [];
  for (const [index, entry] of list.entries()) {
    const triple = Array.isArray(entry)
      ? entry
      : typeof entry === 'object' && entry !== null
        ? [(entry as Vec3).x, (entry as Vec3).y, (entry as Vec3).z ?? 0]
        : [];
    const [x, y, z = 0] = triple as unknown[];
    if (![x, y, z].every((n) => typeof n === 'number' && Number.isFinite(n))) {
      return { error: `Point ${index + 1}: expected numbers x, y and z in metres` };
    }
    points.push({ x: x as number, y: y as number, z: z as number });
  }
  return { points };
}
